// A local SMTP catcher for the demo and the tests: smtp-server accepts mail on loopback,
// mailparser reads it, the mailbox keeps it; a small web view and a JSON API show it.
//   GET /messages (newest first, with text and html) · GET /messages/:id · DELETE /messages
//   GET / (list) · GET /view/:id (one message) · GET /health
import { createServer, type Server } from 'node:http';
import type { AddressInfo } from 'node:net';
import { simpleParser, type AddressObject } from 'mailparser';
import { SMTPServer } from 'smtp-server';
import { Mailbox } from './mailbox';
import { listPage, messagePage } from './web-view';

export interface MailCatcherOptions {
	host?: string;
	smtpPort: number;
	/** 0 or undefined: no web view (tests that only need SMTP). */
	webPort?: number;
	/** JSON file that keeps the mailbox across restarts; null keeps it in memory only. */
	file?: string | null;
	log?: (line: string) => void;
}

export interface MailCatcher {
	mailbox: Mailbox;
	smtpPort: number;
	webUrl: string | null;
	close(): Promise<void>;
}

const addresses = (a: AddressObject | AddressObject[] | undefined) =>
	(Array.isArray(a) ? a : a ? [a] : []).map((x) => x.text).join(', ');

function startSmtp(mailbox: Mailbox, host: string, port: number, log?: (l: string) => void) {
	const smtp = new SMTPServer({
		// Loopback only, no TLS, any or no login: it is a catcher, not a relay.
		disabledCommands: ['STARTTLS'],
		authOptional: true,
		onAuth: (_auth, _session, callback) => callback(null, { user: 'catcher' }),
		size: 20 * 1024 * 1024,
		logger: false,
		onData(stream, session, callback) {
			simpleParser(stream)
				.then((parsed) => {
					const caught = mailbox.add({
						envelope: {
							from: session.envelope.mailFrom ? session.envelope.mailFrom.address : null,
							to: session.envelope.rcptTo.map((r) => r.address)
						},
						from: addresses(parsed.from),
						to: addresses(parsed.to),
						subject: parsed.subject ?? '',
						text: parsed.text ?? '',
						html: typeof parsed.html === 'string' ? parsed.html : null
					});
					log?.(`caught "${caught.subject}" for ${caught.to}`);
					callback();
				})
				.catch((error: Error) => callback(error));
		}
	});
	return new Promise<SMTPServer>((resolve, reject) => {
		smtp.once('error', reject);
		smtp.listen(port, host, () => resolve(smtp));
	});
}

function startWeb(mailbox: Mailbox, host: string, port: number) {
	const server = createServer((req, res) => {
		const url = new URL(req.url ?? '/', 'http://catcher');
		const send = (status: number, type: string, body: string) => {
			res.writeHead(status, {
				'content-type': type,
				'cache-control': 'no-store',
				'x-content-type-options': 'nosniff',
				// The page itself has no scripts; the mail's HTML sits in a sandboxed srcdoc frame.
				'content-security-policy':
					"default-src 'none'; style-src 'unsafe-inline'; img-src data:; form-action 'self'; frame-ancestors 'none'"
			});
			res.end(body);
		};
		const json = (status: number, body: unknown) =>
			send(status, 'application/json; charset=utf-8', JSON.stringify(body));
		const one = /^\/(messages|view)\/([\w-]+)$/.exec(url.pathname);
		if (req.method === 'GET' && url.pathname === '/health') return json(200, { ok: true });
		if (req.method === 'GET' && url.pathname === '/messages') return json(200, mailbox.list());
		if (req.method === 'DELETE' && url.pathname === '/messages') {
			mailbox.clear();
			return json(200, { deleted: true });
		}
		if (req.method === 'POST' && url.pathname === '/clear') {
			mailbox.clear();
			res.writeHead(303, { location: '/' }).end();
			return;
		}
		if (req.method === 'GET' && url.pathname === '/')
			return send(200, 'text/html; charset=utf-8', listPage(mailbox.list()));
		if (req.method === 'GET' && one) {
			const message = mailbox.get(one[2]!);
			if (one[1] === 'messages')
				return message ? json(200, message) : json(404, { message: 'No such message' });
			return message
				? send(200, 'text/html; charset=utf-8', messagePage(message))
				: send(404, 'text/plain; charset=utf-8', 'No such message');
		}
		json(404, { message: 'Not found' });
	});
	return new Promise<Server>((resolve, reject) => {
		server.once('error', reject);
		server.listen(port, host, () => resolve(server));
	});
}

export async function startMailCatcher(options: MailCatcherOptions): Promise<MailCatcher> {
	const host = options.host ?? '127.0.0.1';
	const mailbox = new Mailbox(options.file ?? null);
	const smtp = await startSmtp(mailbox, host, options.smtpPort, options.log);
	const web = options.webPort ? await startWeb(mailbox, host, options.webPort) : null;
	return {
		mailbox,
		smtpPort: options.smtpPort,
		webUrl: web ? `http://${host}:${(web.address() as AddressInfo).port}` : null,
		async close() {
			await new Promise<void>((resolve) => smtp.close(() => resolve()));
			if (web) {
				web.closeAllConnections();
				await new Promise<void>((resolve) => web.close(() => resolve()));
			}
		}
	};
}
