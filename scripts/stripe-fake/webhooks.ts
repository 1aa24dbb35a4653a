// Webhook delivery as Stripe does it: the event JSON POSTed with
// `Stripe-Signature: t=<unix seconds>,v1=<hex HMAC-SHA256 of "t.payload" keyed by the endpoint
// secret>`, retried with exponential backoff while the endpoint answers non-2xx or cannot be
// reached.
import { createHmac } from 'node:crypto';

export function signatureHeader(payload: string, secret: string, timestamp: number): string {
	const v1 = createHmac('sha256', secret).update(`${timestamp}.${payload}`, 'utf8').digest('hex');
	return `t=${timestamp},v1=${v1}`;
}

export interface Delivery {
	eventId: string;
	attempt: number;
	/** HTTP status, or 0 when the connection failed. */
	status: number;
	at: string;
}

export interface DeliveryOptions {
	url: string;
	secret: string;
	/** First retry after this many ms, doubling each time. */
	retryBaseMs: number;
	maxAttempts: number;
	log: (line: string) => void;
}

/** One signed POST; resolves to the HTTP status or 0 on a connection error. */
export async function postSigned(options: DeliveryOptions, payload: string): Promise<number> {
	const header = signatureHeader(payload, options.secret, Math.floor(Date.now() / 1000));
	try {
		const response = await fetch(options.url, {
			method: 'POST',
			headers: { 'content-type': 'application/json; charset=utf-8', 'stripe-signature': header },
			body: payload,
			signal: AbortSignal.timeout(10_000)
		});
		await response.arrayBuffer();
		return response.status;
	} catch {
		return 0;
	}
}

/** Delivers until a 2xx or `maxAttempts`; records every attempt in `record`. */
export async function deliver(
	options: DeliveryOptions,
	eventId: string,
	payload: string,
	record: (d: Delivery) => void
): Promise<boolean> {
	for (let attempt = 1; attempt <= options.maxAttempts; attempt++) {
		const status = await postSigned(options, payload);
		record({ eventId, attempt, status, at: new Date().toISOString() });
		if (status >= 200 && status < 300) return true;
		const wait = options.retryBaseMs * 2 ** (attempt - 1);
		options.log(
			`webhook ${eventId} attempt ${attempt} → ${status || 'no connection'}; retry in ${wait} ms`
		);
		if (attempt < options.maxAttempts) await new Promise((r) => setTimeout(r, wait));
	}
	options.log(`webhook ${eventId} given up after ${options.maxAttempts} attempts`);
	return false;
}
