/**
 * A local stand-in for the part of Stripe's HTTP API that Landfall calls, with Stripe's
 * conventions: form-encoded bodies, `Authorization: Bearer sk_test_…`, `Idempotency-Key`,
 * objects with `id` and `object`, Stripe's error JSON and status codes. It also serves a minimal
 * hosted payment page and delivers signed webhooks. State lives in memory.
 *
 * Routes: POST /v1/checkout/sessions, GET /v1/checkout/sessions/:id,
 * POST /v1/checkout/sessions/:id/expire, GET /v1/payment_intents/:id, POST /v1/refunds,
 * GET /v1/refunds/:id, GET /v1/events/:id; the page GET|POST /pay/:id; for tests only
 * POST /_fake/checkout/sessions/:id/pay, POST /_fake/events/:id/redeliver, GET /_fake/deliveries.
 */
import { createServer, type IncomingMessage, type ServerResponse } from 'node:http';
import type { AddressInfo } from 'node:net';
import Stripe from 'stripe';
import { StripeFakeError, invalidParam, missingParam, noSuch } from './errors';
import { fingerprint, parseStripeForm, type FormObject, type FormValue } from './form';
import {
	Store,
	newId,
	now,
	type CheckoutSession,
	type Metadata,
	type StripeEvent
} from './objects';
import { payPage } from './pay-page';

// Events carry the API version of the SDK Landfall uses.
const ApiVersion = Stripe.API_VERSION;
import { deliver, postSigned, type Delivery, type DeliveryOptions } from './webhooks';

export interface StripeFakeOptions {
	host?: string;
	/** 0 picks a free port. */
	port: number;
	/** The only secret key accepted (sk_test_…). */
	apiKey: string;
	/** Where events are POSTed; null delivers none. */
	webhookUrl: string | null;
	webhookSecret: string;
	retryBaseMs?: number;
	maxAttempts?: number;
	log?: (line: string) => void;
	/** What an earlier run held, so a restarted fake still knows it (as Stripe would). */
	store?: Store;
}

export interface StripeFake {
	url: string;
	port: number;
	store: Store;
	deliveries: Delivery[];
	/** Resolves when every delivery started so far has finished (delivered or given up). */
	settled(): Promise<void>;
	close(): Promise<void>;
}

const TEST_CARD_OK = '4242424242424242';
const TEST_CARD_DECLINED = '4000000000000002';
const MAX_AMOUNT = 99_999_999; // Stripe's eight-digit limit in minor units (from memory)

type Params = FormObject;
type Answer = { status: number; body: unknown };

const str = (p: Params, key: string): string | undefined => {
	const v = p[key];
	return typeof v === 'string' ? v : undefined;
};
const obj = (v: FormValue | undefined): Params | undefined =>
	v && typeof v === 'object' && !Array.isArray(v) ? v : undefined;

function metadata(value: FormValue | undefined, param: string): Metadata {
	if (value === undefined || value === '') return {};
	const o = obj(value);
	if (!o) throw invalidParam(param, `Invalid object: ${param} must be a hash of strings.`);
	const out: Metadata = {};
	for (const [k, v] of Object.entries(o)) {
		if (typeof v !== 'string')
			throw invalidParam(`${param}[${k}]`, 'Metadata values must be strings.');
		if (k.length > 40 || v.length > 500)
			throw invalidParam(
				`${param}[${k}]`,
				'Metadata keys are at most 40 and values 500 characters.'
			);
		out[k] = v;
	}
	return out;
}

function integer(value: string | undefined, param: string, min: number): number {
	if (value === undefined) throw missingParam(param);
	if (!/^\d+$/.test(value) || Number(value) < min || !Number.isSafeInteger(Number(value)))
		throw invalidParam(param, `Invalid integer: ${value}`);
	return Number(value);
}

async function readBody(req: IncomingMessage): Promise<string> {
	const chunks: Buffer[] = [];
	let size = 0;
	for await (const chunk of req) {
		size += (chunk as Buffer).length;
		if (size > 1_000_000)
			throw new StripeFakeError(413, 'invalid_request_error', 'Request body too large.');
		chunks.push(chunk as Buffer);
	}
	return Buffer.concat(chunks).toString('utf8');
}

export async function startStripeFake(options: StripeFakeOptions): Promise<StripeFake> {
	const host = options.host ?? '127.0.0.1';
	const log = options.log ?? (() => {});
	const store = options.store ?? new Store();
	const deliveries: Delivery[] = [];
	const pending = new Set<Promise<unknown>>();
	let base = '';

	const delivery: Omit<DeliveryOptions, 'url'> = {
		secret: options.webhookSecret,
		retryBaseMs: options.retryBaseMs ?? 1000,
		maxAttempts: options.maxAttempts ?? 8,
		log
	};

	const track = (p: Promise<unknown>) => {
		pending.add(p);
		void p.finally(() => pending.delete(p));
	};

	function emit(type: string, object: unknown, idempotencyKey: string | null = null): StripeEvent {
		const event: StripeEvent = {
			id: newId('evt_'),
			object: 'event',
			api_version: ApiVersion,
			created: now(),
			data: { object: structuredClone(object) },
			livemode: false,
			pending_webhooks: options.webhookUrl ? 1 : 0,
			request: { id: newId('req_'), idempotency_key: idempotencyKey },
			type
		};
		store.events.set(event.id, event);
		if (options.webhookUrl) {
			const url = options.webhookUrl;
			track(
				deliver({ ...delivery, url }, event.id, JSON.stringify(event), (d) => deliveries.push(d))
			);
		}
		return event;
	}

	/** An open session past its expiry becomes expired, as Stripe does on its own. */
	function refresh(session: CheckoutSession): CheckoutSession {
		if (session.status === 'open' && now() >= session.expires_at) expire(session);
		return session;
	}

	function expire(session: CheckoutSession): void {
		session.status = 'expired';
		session.url = null;
		emit('checkout.session.expired', session);
	}

	function findSession(id: string): CheckoutSession {
		const session = store.sessions.get(id);
		if (!session) throw noSuch('checkout.session', id);
		return refresh(session);
	}

	function createSession(p: Params, idempotencyKey: string | null): CheckoutSession {
		const mode = str(p, 'mode');
		if (!mode) throw missingParam('mode');
		if (mode !== 'payment')
			throw invalidParam('mode', 'This local fake supports mode=payment only.');
		const successUrl = str(p, 'success_url');
		if (!successUrl) throw missingParam('success_url');
		const items = p['line_items'];
		if (!Array.isArray(items) || items.length === 0) throw missingParam('line_items');
		let total = 0;
		let currency = '';
		items.forEach((raw, i) => {
			const item = obj(raw);
			const price = obj(item?.['price_data']);
			if (!item || !price) throw missingParam(`line_items[${i}][price_data]`);
			const c = str(price, 'currency');
			if (!c || !/^[a-z]{3}$/.test(c)) throw missingParam(`line_items[${i}][price_data][currency]`);
			if (currency && c !== currency)
				throw invalidParam(
					`line_items[${i}][price_data][currency]`,
					'All line items must use the same currency.'
				);
			currency = c;
			if (!str(obj(price['product_data']) ?? {}, 'name'))
				throw missingParam(`line_items[${i}][price_data][product_data][name]`);
			const unit = integer(
				str(price, 'unit_amount'),
				`line_items[${i}][price_data][unit_amount]`,
				1
			);
			total += unit * integer(str(item, 'quantity'), `line_items[${i}][quantity]`, 1);
		});
		if (total > MAX_AMOUNT)
			throw new StripeFakeError(
				400,
				'invalid_request_error',
				'Amount must be no more than 99999999 in the smallest currency unit.',
				'amount_too_large',
				'line_items'
			);
		const created = now();
		const expiresAt = str(p, 'expires_at')
			? integer(str(p, 'expires_at'), 'expires_at', 0)
			: created + 24 * 3600;
		if (expiresAt < created + 30 * 60 || expiresAt > created + 24 * 3600)
			throw invalidParam(
				'expires_at',
				'The Checkout Session expiry must be between 30 minutes and 24 hours from now.'
			);
		const id = newId('cs_test_');
		const session: CheckoutSession = {
			id,
			object: 'checkout.session',
			amount_subtotal: total,
			amount_total: total,
			cancel_url: str(p, 'cancel_url') ?? null,
			success_url: successUrl,
			client_reference_id: str(p, 'client_reference_id') ?? null,
			created,
			currency,
			customer_email: str(p, 'customer_email') ?? null,
			expires_at: expiresAt,
			livemode: false,
			metadata: metadata(p['metadata'], 'metadata'),
			mode: 'payment',
			payment_intent: null,
			payment_status: 'unpaid',
			status: 'open',
			url: `${base}/pay/${id}`
		};
		store.sessions.set(id, session);
		store.intentMetadata.set(
			id,
			metadata(obj(p['payment_intent_data'])?.['metadata'], 'payment_intent_data[metadata]')
		);
		void idempotencyKey;
		return session;
	}

	/** What the hosted page does with a card; `amount` overrides the captured amount (tests). */
	function pay(session: CheckoutSession, cardNumber: string, amount?: number) {
		if (session.status !== 'open')
			return { outcome: 'closed' as const, message: 'This payment session is no longer open.' };
		const card = cardNumber.replace(/[\s-]/g, '');
		if (card !== TEST_CARD_OK && card !== TEST_CARD_DECLINED)
			return {
				outcome: 'invalid' as const,
				message: 'This test page takes only the test cards shown below.'
			};
		let intent = session.payment_intent ? store.intents.get(session.payment_intent) : undefined;
		if (!intent) {
			intent = {
				id: newId('pi_'),
				object: 'payment_intent',
				amount: session.amount_total,
				amount_received: 0,
				currency: session.currency,
				created: now(),
				latest_charge: null,
				last_payment_error: null,
				livemode: false,
				metadata: { ...store.intentMetadata.get(session.id) },
				status: 'requires_payment_method'
			};
			store.intents.set(intent.id, intent);
		}
		if (card === TEST_CARD_DECLINED) {
			intent.status = 'requires_payment_method';
			intent.last_payment_error = {
				code: 'card_declined',
				decline_code: 'generic_decline',
				message: 'Your card was declined.',
				type: 'card_error'
			};
			emit('payment_intent.payment_failed', intent);
			return {
				outcome: 'declined' as const,
				message: 'The card was declined. Nothing was charged; you can try another card.'
			};
		}
		const captured = amount ?? session.amount_total;
		const charge = {
			id: newId('ch_'),
			object: 'charge' as const,
			amount: captured,
			amount_captured: captured,
			amount_refunded: 0,
			created: now(),
			currency: session.currency,
			livemode: false as const,
			metadata: { ...intent.metadata },
			paid: true,
			payment_intent: intent.id,
			refunded: false,
			status: 'succeeded' as const
		};
		store.charges.set(charge.id, charge);
		Object.assign(intent, {
			amount: captured,
			amount_received: captured,
			latest_charge: charge.id,
			last_payment_error: null,
			status: 'succeeded'
		});
		Object.assign(session, {
			amount_total: captured,
			payment_intent: intent.id,
			payment_status: 'paid',
			status: 'complete',
			url: null
		});
		emit('payment_intent.succeeded', intent);
		const completed = emit('checkout.session.completed', session);
		return { outcome: 'paid' as const, message: 'Paid.', event: completed.id };
	}

	function createRefund(p: Params, idempotencyKey: string | null) {
		const intentId = str(p, 'payment_intent');
		const chargeId = str(p, 'charge');
		if (!intentId && !chargeId) throw missingParam('payment_intent');
		const intent = intentId ? store.intents.get(intentId) : undefined;
		if (intentId && !intent) throw noSuch('payment_intent', intentId);
		const charge = store.charges.get(chargeId ?? intent?.latest_charge ?? '');
		if (!charge)
			throw new StripeFakeError(
				400,
				'invalid_request_error',
				`This PaymentIntent (${intentId}) does not have a successful charge to refund.`,
				'charge_not_refundable'
			);
		const left = charge.amount - charge.amount_refunded;
		if (left === 0)
			throw new StripeFakeError(
				400,
				'invalid_request_error',
				`Charge ${charge.id} has already been refunded.`,
				'charge_already_refunded'
			);
		const amount = str(p, 'amount') ? integer(str(p, 'amount'), 'amount', 1) : left;
		if (amount > left)
			throw new StripeFakeError(
				400,
				'invalid_request_error',
				`Refund amount (${amount}) is greater than unrefunded amount on charge (${left})`,
				'amount_too_large',
				'amount'
			);
		const refund = {
			id: newId('re_'),
			object: 'refund' as const,
			amount,
			charge: charge.id,
			created: now(),
			currency: charge.currency,
			metadata: metadata(p['metadata'], 'metadata'),
			payment_intent: charge.payment_intent,
			reason: str(p, 'reason') ?? null,
			status: 'succeeded' as const
		};
		store.refunds.set(refund.id, refund);
		charge.amount_refunded += amount;
		charge.refunded = charge.amount_refunded === charge.amount;
		emit('refund.created', refund, idempotencyKey);
		emit('charge.refunded', charge, idempotencyKey);
		return refund;
	}

	function api(method: string, path: string, p: Params, key: string | null): Answer {
		let m: RegExpExecArray | null;
		if (method === 'POST' && path === '/v1/checkout/sessions')
			return { status: 200, body: createSession(p, key) };
		if (method === 'GET' && (m = /^\/v1\/checkout\/sessions\/([^/]+)$/.exec(path)))
			return { status: 200, body: findSession(m[1]!) };
		if (method === 'POST' && (m = /^\/v1\/checkout\/sessions\/([^/]+)\/expire$/.exec(path))) {
			const session = findSession(m[1]!);
			if (session.status !== 'open')
				throw new StripeFakeError(
					400,
					'invalid_request_error',
					'Only Checkout Sessions with a status in ["open"] can be expired.',
					'checkout_session_not_open'
				);
			expire(session);
			return { status: 200, body: session };
		}
		if (method === 'GET' && (m = /^\/v1\/payment_intents\/([^/]+)$/.exec(path))) {
			const intent = store.intents.get(m[1]!);
			if (!intent) throw noSuch('payment_intent', m[1]!);
			return { status: 200, body: intent };
		}
		if (method === 'POST' && path === '/v1/refunds')
			return { status: 200, body: createRefund(p, key) };
		if (method === 'GET' && (m = /^\/v1\/refunds\/([^/]+)$/.exec(path))) {
			const refund = store.refunds.get(m[1]!);
			if (!refund) throw noSuch('refund', m[1]!);
			return { status: 200, body: refund };
		}
		if (method === 'GET' && (m = /^\/v1\/events\/([^/]+)$/.exec(path))) {
			const event = store.events.get(m[1]!);
			if (!event) throw noSuch('event', m[1]!);
			return { status: 200, body: event };
		}
		return control(method, path, p);
	}

	/** Test-only controls: pay without the page (optionally another amount), redeliver, list deliveries. */
	function control(method: string, path: string, p: Params): Answer {
		let m: RegExpExecArray | null;
		if (method === 'POST' && (m = /^\/_fake\/checkout\/sessions\/([^/]+)\/pay$/.exec(path))) {
			const session = findSession(m[1]!);
			const amount = str(p, 'amount') ? integer(str(p, 'amount'), 'amount', 1) : undefined;
			const result = pay(session, str(p, 'card') ?? '', amount);
			return { status: result.outcome === 'paid' ? 200 : 402, body: { ...result, session } };
		}
		if (method === 'POST' && (m = /^\/_fake\/events\/([^/]+)\/redeliver$/.exec(path))) {
			const event = store.events.get(m[1]!);
			if (!event) throw noSuch('event', m[1]!);
			if (!options.webhookUrl) throw invalidParam('webhook', 'No webhook endpoint is configured.');
			const copies = str(p, 'copies') ? integer(str(p, 'copies'), 'copies', 1) : 1;
			const payload = JSON.stringify(event);
			const url = options.webhookUrl;
			const run = Promise.all(
				Array.from({ length: Math.min(copies, 20) }, () =>
					postSigned({ ...delivery, url }, payload)
				)
			);
			track(run);
			return { status: 202, body: { object: 'list', data: [], accepted: copies } };
		}
		if (method === 'GET' && path === '/_fake/deliveries')
			return { status: 200, body: { object: 'list', data: deliveries } };
		throw new StripeFakeError(
			404,
			'invalid_request_error',
			`Unrecognized request URL (${method}: ${path}).`
		);
	}

	function authorise(req: IncomingMessage): void {
		const header = req.headers.authorization ?? '';
		const bearer = /^Bearer (\S+)$/.exec(header)?.[1];
		if (!bearer)
			throw new StripeFakeError(
				401,
				'invalid_request_error',
				"You did not provide an API key. Provide your secret key in the Authorization header, using Bearer auth (e.g. 'Authorization: Bearer sk_test_…')."
			);
		if (bearer !== options.apiKey || !bearer.startsWith('sk_test_'))
			throw new StripeFakeError(
				401,
				'invalid_request_error',
				`Invalid API Key provided: ${bearer.slice(0, 8)}${'*'.repeat(Math.max(0, bearer.length - 12))}${bearer.slice(-4)}`,
				'api_key_invalid'
			);
	}

	function idempotent(req: IncomingMessage, path: string, p: Params, run: () => Answer): Answer {
		const key = req.headers['idempotency-key'];
		if (req.method !== 'POST' || typeof key !== 'string' || key === '') return run();
		const slot = `${options.apiKey}\u0000${key}`;
		const request = `${req.method} ${path} ${fingerprint(p)}`;
		const seen = store.idempotent.get(slot);
		if (seen) {
			if (seen.request !== request)
				throw new StripeFakeError(
					400,
					'idempotency_error',
					`Keys for idempotent requests can only be used with the same parameters they were first used with. Try using a key other than '${key}' if you meant to execute a different request.`
				);
			return seen;
		}
		let answer: Answer;
		try {
			answer = run();
		} catch (e) {
			if (!(e instanceof StripeFakeError) || e.status >= 500) throw e;
			answer = { status: e.status, body: e.body() };
		}
		store.idempotent.set(slot, { request, ...answer });
		return answer;
	}

	function page(res: ServerResponse, status: number, html: string) {
		res.writeHead(status, {
			'content-type': 'text/html; charset=utf-8',
			'cache-control': 'no-store'
		});
		res.end(html);
	}

	async function payPageRoute(req: IncomingMessage, res: ServerResponse, id: string) {
		const session = store.sessions.get(id);
		if (!session)
			return page(
				res,
				404,
				'<!doctype html><title>Not found</title><p>No such payment session.</p>'
			);
		refresh(session);
		const description = `Amount requested by the merchant (reference ${session.client_reference_id ?? session.id}).`;
		if (req.method === 'GET') return page(res, 200, payPage({ session, description }));
		const form = new URLSearchParams(await readBody(req));
		const card = form.get('card') ?? '';
		const expiry = (form.get('expiry') ?? '').trim();
		const cvc = (form.get('cvc') ?? '').trim();
		const problem = !/^(0[1-9]|1[0-2])\s*\/?\s*\d{2}$/.test(expiry)
			? 'Enter the expiry as MM/YY.'
			: !/^\d{3,4}$/.test(cvc)
				? 'Enter a security code of three or four digits.'
				: null;
		if (problem)
			return page(
				res,
				400,
				payPage({ session, description, card, notice: { tone: 'error', text: problem } })
			);
		const result = pay(session, card);
		if (result.outcome === 'paid') {
			res.writeHead(303, {
				location: session.success_url.replace('{CHECKOUT_SESSION_ID}', session.id)
			});
			return res.end();
		}
		const status = result.outcome === 'declined' ? 402 : 400;
		return page(
			res,
			status,
			payPage({ session, description, card, notice: { tone: 'error', text: result.message } })
		);
	}

	async function handle(req: IncomingMessage, res: ServerResponse) {
		const url = new URL(req.url ?? '/', base);
		const method = req.method ?? 'GET';
		try {
			const pay = /^\/pay\/([^/]+)$/.exec(url.pathname);
			if (pay) return await payPageRoute(req, res, pay[1]!);
			if (url.pathname === '/health') {
				res.writeHead(200, { 'content-type': 'application/json' });
				return res.end('{"ok":true}');
			}
			authorise(req);
			const body = method === 'GET' ? url.search.slice(1) : await readBody(req);
			const params = parseStripeForm(body);
			const answer = idempotent(req, url.pathname, params, () =>
				api(method, url.pathname, params, (req.headers['idempotency-key'] as string) ?? null)
			);
			res.writeHead(answer.status, {
				'content-type': 'application/json',
				'request-id': newId('req_'),
				'stripe-version': ApiVersion
			});
			res.end(JSON.stringify(answer.body));
		} catch (e) {
			const error =
				e instanceof StripeFakeError
					? e
					: new StripeFakeError(500, 'api_error', 'The local Stripe fake failed on this request.');
			if (!(e instanceof StripeFakeError)) log(`error on ${method} ${url.pathname}: ${String(e)}`);
			res.writeHead(error.status, { 'content-type': 'application/json' });
			res.end(JSON.stringify(error.body()));
		}
	}

	const server = createServer((req, res) => void handle(req, res));
	await new Promise<void>((resolve, reject) => {
		server.once('error', reject);
		server.listen(options.port, host, () => resolve());
	});
	const port = (server.address() as AddressInfo).port;
	base = `http://${host}:${port}`;
	return {
		url: base,
		port,
		store,
		deliveries,
		async settled() {
			while (pending.size > 0) await Promise.allSettled([...pending]);
		},
		close: () =>
			new Promise<void>((resolve) => {
				server.closeAllConnections();
				server.close(() => resolve());
			})
	};
}
