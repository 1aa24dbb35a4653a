/**
 * nodemailer over SMTP, configured only from environment variables, so a real SMTP server needs
 * no code change:
 *   SMTP_HOST (127.0.0.1), SMTP_PORT (4325, the local catcher), SMTP_SECURE (true for implicit
 *   TLS, usually port 465), SMTP_USER and SMTP_PASS (both or neither), MAIL_FROM.
 */
import nodemailer, { type Transporter } from 'nodemailer';

export interface SmtpConfig {
	host: string;
	port: number;
	secure: boolean;
	user?: string;
	pass?: string;
	from: string;
}

export class MailNotConfigured extends Error {}

export function smtpConfigFrom(source: Record<string, string | undefined>): SmtpConfig {
	const port = Number(source.SMTP_PORT?.trim() || 4325);
	if (!(Number.isInteger(port) && port > 0 && port < 65536))
		throw new MailNotConfigured('SMTP_PORT must be a port number.');
	const secure = (source.SMTP_SECURE?.trim() || 'false').toLowerCase();
	if (secure !== 'true' && secure !== 'false')
		throw new MailNotConfigured('SMTP_SECURE must be true or false.');
	const user = source.SMTP_USER?.trim() || undefined;
	const pass = source.SMTP_PASS || undefined;
	if (Boolean(user) !== Boolean(pass))
		throw new MailNotConfigured('Set both SMTP_USER and SMTP_PASS, or neither.');
	return {
		host: source.SMTP_HOST?.trim() || '127.0.0.1',
		port,
		secure: secure === 'true',
		user,
		pass,
		from: source.MAIL_FROM?.trim() || 'Landfall <landfall@solvrae.example>'
	};
}

export interface MailTransport {
	from: string;
	send(message: { to: string; subject: string; html: string; text: string }): Promise<void>;
	close(): void;
}

export function createTransport(config: SmtpConfig): MailTransport {
	const transporter: Transporter = nodemailer.createTransport({
		host: config.host,
		port: config.port,
		secure: config.secure,
		auth: config.user ? { user: config.user, pass: config.pass } : undefined,
		// An unreachable server must fail a send quickly; the outbox retries it later.
		connectionTimeout: 10_000,
		greetingTimeout: 10_000,
		socketTimeout: 20_000
	});
	return {
		from: config.from,
		async send(message) {
			await transporter.sendMail({ from: config.from, ...message });
		},
		close: () => transporter.close()
	};
}
