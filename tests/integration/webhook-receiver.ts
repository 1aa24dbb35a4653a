// A small HTTP server on a free loopback port that hands what the Stripe fake delivers to the
// app's own webhook route (its POST handler), so tests see the fake's real signed deliveries.
import { createServer, type Server } from 'node:http';
import type { AddressInfo } from 'node:net';
import type { RequestEvent } from '@sveltejs/kit';
import { POST as webhook } from '../../src/routes/api/v1/stripe/webhook/+server';

export const callWebhook = (origin: string, body: string, signature: string | null) =>
	webhook({
		request: new Request(`${origin}/api/v1/stripe/webhook`, {
			method: 'POST',
			headers: signature ? { 'stripe-signature': signature } : {},
			body
		})
	} as unknown as RequestEvent<Record<string, never>, '/api/v1/stripe/webhook'>);

export interface WebhookReceiver {
	url: string;
	close(): Promise<void>;
}

/**
 * `intercept` may answer a delivery itself (return a status) instead of passing it on, to make
 * the fake retry; `answered` hears every status given.
 */
export async function startWebhookReceiver(
	origin: string,
	options: { intercept?: () => number | null; answered?: (status: number) => void } = {}
): Promise<WebhookReceiver> {
	const server: Server = createServer((req, res) => {
		const chunks: Buffer[] = [];
		req.on('data', (c: Buffer) => chunks.push(c));
		req.on('end', () => {
			void (async () => {
				const own = options.intercept?.() ?? null;
				if (own !== null) {
					options.answered?.(own);
					res.writeHead(own).end();
					return;
				}
				const signature = req.headers['stripe-signature'];
				const response = await callWebhook(
					origin,
					Buffer.concat(chunks).toString('utf8'),
					typeof signature === 'string' ? signature : null
				);
				options.answered?.(response.status);
				res.writeHead(response.status, { 'content-type': 'application/json' });
				res.end(await response.text());
			})();
		});
	});
	await new Promise<void>((r) => server.listen(0, '127.0.0.1', r));
	return {
		url: `http://127.0.0.1:${(server.address() as AddressInfo).port}/`,
		close: () => new Promise<void>((r) => server.close(() => r()))
	};
}
