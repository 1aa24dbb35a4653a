// Freight deposits end to end against the real database, the real Stripe SDK and the local
// Stripe fake (scripts/stripe-fake) on 127.0.0.1:12111. The fake delivers its signed webhooks to
// a small receiver here that hands them to the app's own webhook route (POST handler).
// If the SDK accepts the fake's answers, they are shaped as Stripe's.
import Decimal from 'decimal.js';
import { QueryTypes } from 'sequelize';
import Stripe from 'stripe';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { percentOfMinor } from '$lib/deposits/minor-units';
import type { SessionUser } from '$lib/server/auth/session-user';
import { Shipment } from '$lib/server/db/models';
import { createStripe, usePayments, type StripeConfig } from '$lib/server/payments/stripe-client';
import {
	cancelDeposit,
	expirePastDue,
	getDeposit,
	listDeposits,
	refundDeposit,
	requestDeposit,
	startCheckout,
	today
} from '$lib/server/services/deposits';
import { shipmentLandedCost } from '$lib/server/services/landed-cost/compute';
import { depositRequestSchema } from '$lib/schemas/deposits';
import { startStripeFake, type StripeFake } from '../../scripts/stripe-fake/app';
import { signatureHeader } from '../../scripts/stripe-fake/webhooks';
import { countRows, sequelize, sessionUserFor } from './db';
import {
	callWebhook as callWebhookAt,
	startWebhookReceiver,
	type WebhookReceiver
} from './webhook-receiver';
import { deleteDeposits } from './deposit-cleanup';
import { ok } from './service-results';

const FAKE_PORT = Number(process.env.STRIPE_FAKE_PORT ?? 12111);
const config: StripeConfig = {
	secretKey: 'sk_test_landfall_integration',
	webhookSecret: 'whsec_landfall_integration',
	host: '127.0.0.1',
	port: FAKE_PORT,
	protocol: 'http'
};
const ORIGIN = 'http://127.0.0.1:4999';
const context = { origin: ORIGIN, ip: '198.51.100.90' }; // RFC 5737 TEST-NET-2

let fake: StripeFake;
let receiver: WebhookReceiver | undefined;
/** The receiver answers 500 to this many deliveries first, to make the fake retry. */
let failNext = 0;
const answers: number[] = [];
let finance: SessionUser;
let coordinator: SessionUser;
let buyer: SessionUser;
let otherBuyer: SessionUser;
let hallvik = '';
let wattlebird = '';
const created: string[] = [];

const callWebhook = (body: string, signature: string | null) =>
	callWebhookAt(ORIGIN, body, signature);

beforeAll(async () => {
	receiver = await startWebhookReceiver(ORIGIN, {
		intercept: () => (failNext > 0 ? (failNext--, 500) : null),
		answered: (status) => answers.push(status)
	});
	fake = await startStripeFake({
		port: FAKE_PORT,
		apiKey: config.secretKey,
		webhookSecret: config.webhookSecret,
		webhookUrl: receiver.url,
		retryBaseMs: 20,
		maxAttempts: 5
	});
	usePayments(config);
	[finance, coordinator, buyer, otherBuyer] = await Promise.all([
		sessionUserFor('finance@solvrae.example'),
		sessionUserFor('coordinator@solvrae.example'),
		sessionUserFor('buyer@hallvik.example'),
		sessionUserFor('buyer@wattlebird.example')
	]);
	const all = await Shipment.findAll({ attributes: ['id', 'notes'] });
	hallvik = all.find((s) => s.notes === 'Demo scenario: hallvik-speakers')!.id;
	wattlebird = all.find((s) => s.notes === 'Demo scenario: wattlebird-sensors')!.id;
});

afterAll(async () => {
	await fake?.close();
	await receiver?.close();
	await deleteDeposits(created);
});

const inDays = (n: number) => new Date(Date.now() + n * 86_400_000).toISOString().slice(0, 10);

/** The request form's input: a fixed amount in EUR due in a week unless told otherwise. */
const requestInput = (fields: Record<string, string>) =>
	depositRequestSchema.parse({ basis: 'amount', currency: 'EUR', dueDate: inDays(7), ...fields });

async function newDeposit(amount = '1250.00', currency = 'EUR', shipmentId = hallvik) {
	const input = requestInput({ amount, currency });
	const { id } = ok(await requestDeposit(finance, shipmentId, input, context), 'request');
	created.push(id);
	return id;
}

async function deposit(id: string) {
	const list = (await listDeposits(finance, hallvik))!;
	return list.find((d) => d.id === id)!;
}

const sessionIdOf = (url: string) => /\/pay\/(cs_test_\w+)$/.exec(url)![1]!;

/** The hosted page's form, posted as a browser would. */
const payOnPage = (url: string, card: string) =>
	fetch(url, {
		method: 'POST',
		redirect: 'manual',
		headers: { 'content-type': 'application/x-www-form-urlencoded' },
		body: new URLSearchParams({ card, expiry: '12/30', cvc: '123' })
	});

/** Who the outbox holds a message of `kind` for, about this deposit. */
const mails = async (kind: string, depositId: string) =>
	(
		await sequelize.query<{ recipient: string }>(
			`SELECT recipient FROM mail_outbox WHERE kind = :kind AND dedupe_key LIKE :key ORDER BY 1`,
			{ type: QueryTypes.SELECT, replacements: { kind, key: `${kind}:${depositId}:%` } }
		)
	).map((r) => r.recipient);

const events = (depositId: string, type: string) =>
	countRows('stripe_events', 'deposit_id = :depositId AND type = :type', { depositId, type });

describe('the Stripe fake through the SDK', () => {
	const sdk = () => createStripe(config);
	const params = (amount: number): Stripe.Checkout.SessionCreateParams => ({
		mode: 'payment',
		line_items: [
			{
				quantity: 1,
				price_data: { currency: 'eur', unit_amount: amount, product_data: { name: 'Test' } }
			}
		],
		success_url: `${ORIGIN}/ok`,
		metadata: { test: 'idempotency' }
	});

	it('answers the same key with the same session, and a changed body with an idempotency error', async () => {
		const key = `itest-${Date.now()}`;
		const a = await sdk().checkout.sessions.create(params(1000), { idempotencyKey: key });
		const b = await sdk().checkout.sessions.create(params(1000), { idempotencyKey: key });
		expect(a.id).toMatch(/^cs_test_/);
		expect(a.object).toBe('checkout.session');
		expect(b.id).toBe(a.id);
		await expect(
			sdk().checkout.sessions.create(params(2000), { idempotencyKey: key })
		).rejects.toBeInstanceOf(Stripe.errors.StripeIdempotencyError);
	});

	it('refuses a wrong key with 401 and a missing parameter with 400, as Stripe does', async () => {
		const wrong = createStripe({ ...config, secretKey: 'sk_test_wrong' });
		await expect(wrong.checkout.sessions.create(params(1000))).rejects.toBeInstanceOf(
			Stripe.errors.StripeAuthenticationError
		);
		const missing = sdk().checkout.sessions.create({ ...params(1000), success_url: undefined });
		await expect(missing).rejects.toMatchObject({
			type: 'StripeInvalidRequestError',
			statusCode: 400,
			param: 'success_url'
		});
		await expect(sdk().checkout.sessions.retrieve('cs_test_nothing')).rejects.toMatchObject({
			statusCode: 404,
			code: 'resource_missing'
		});
	});
});

describe('requesting a deposit', () => {
	it('keeps the amount in ISO 4217 minor units and refuses decimals the currency lacks', async () => {
		const id = await newDeposit('1250.5', 'EUR');
		expect(await deposit(id)).toMatchObject({ amountMinor: '125050', amount: 'EUR 1,250.50' });
		const jpy = requestInput({ amount: '1500.5', currency: 'JPY' });
		const refused = await requestDeposit(finance, hallvik, jpy, context);
		expect(refused).toMatchObject({
			ok: false,
			status: 400,
			fieldErrors: { amount: /no decimals/ }
		});
		const kwd = await newDeposit('12.345', 'KWD');
		expect((await deposit(kwd)).amountMinor).toBe('12345');
	});

	it('takes a percentage of the chosen mode’s freight estimate and keeps the estimate', async () => {
		// Hallvik's chosen mode is sea full container (demo data).
		const input = requestInput({ basis: 'percent', percent: '30' });
		const { id } = ok(await requestDeposit(coordinator, hallvik, input, context), 'percent');
		created.push(id);
		const d = await deposit(id);
		const lc = await shipmentLandedCost(finance, hallvik, 'sea_fcl', {
			date: today(),
			reportCurrency: 'EUR'
		});
		if (!lc.ok || !lc.result.ok) throw new Error('no estimate');
		const freight = lc.result.components.freight.amount;
		expect(d.estimate).toMatchObject({ currency: 'EUR', mode: 'sea_fcl', date: today() });
		expect(new Decimal(d.estimate!.amount).eq(freight)).toBe(true);
		expect(d.amountMinor).toBe(percentOfMinor(freight, '30', 'EUR').toString());
	});

	it('says as a field error when no estimate can be computed', async () => {
		// Wattlebird's demo shipment has no chosen mode.
		const input = requestInput({ basis: 'percent', percent: '20', currency: 'AUD' });
		const result = await requestDeposit(finance, wattlebird, input, context);
		expect(result).toMatchObject({
			ok: false,
			status: 400,
			fieldErrors: { percent: /no chosen mode/ }
		});
	});

	it('is for finance and coordinators; customers see only their own organization’s', async () => {
		const input = requestInput({ amount: '10' });
		expect(await requestDeposit(buyer, hallvik, input, context)).toMatchObject({ status: 403 });
		const id = await newDeposit('99.00');
		expect((await listDeposits(buyer, hallvik))!.map((d) => d.id)).toContain(id);
		expect(await listDeposits(otherBuyer, hallvik)).toBeNull();
		expect(await startCheckout(otherBuyer, hallvik, id, ORIGIN)).toMatchObject({
			ok: false,
			status: 404
		});
	});

	it('finds a deposit only on its own shipment, for staff and its own customer alike', async () => {
		const id = await newDeposit('64.00');
		const before = await deposit(id);
		const notFound = { ok: false, status: 404 };
		expect(await startCheckout(buyer, wattlebird, id, ORIGIN)).toMatchObject(notFound);
		expect(await startCheckout(otherBuyer, wattlebird, id, ORIGIN)).toMatchObject(notFound);
		expect(await cancelDeposit(coordinator, wattlebird, id, before.version, null)).toMatchObject(
			notFound
		);
		expect(await refundDeposit(finance, wattlebird, id, before.version, null)).toMatchObject(
			notFound
		);
		expect(await getDeposit(finance, wattlebird, id)).toBeNull();
		expect(await deposit(id)).toEqual(before);
	});
});

describe('paying through Checkout and the webhook', () => {
	it('creates one Checkout Session per deposit with metadata, and reuses it', async () => {
		const id = await newDeposit('480.00');
		const first = ok(await startCheckout(buyer, hallvik, id, ORIGIN), 'checkout');
		const again = ok(await startCheckout(buyer, hallvik, id, ORIGIN), 'checkout again');
		expect(again.url).toBe(first.url);
		const session = await createStripe(config).checkout.sessions.retrieve(sessionIdOf(first.url));
		expect(session).toMatchObject({
			amount_total: 48000,
			currency: 'eur',
			status: 'open',
			metadata: { deposit_id: id, amount_minor: '48000', currency: 'EUR' },
			client_reference_id: id
		});
		expect(session.success_url).toContain(`/deposits/${id}/paid`);
		expect((await deposit(id)).state).toBe('requested');
	});

	it('marks the deposit paid only from the webhook, once, even when delivered twice or concurrently', async () => {
		const id = await newDeposit('1250.00');
		const { url } = ok(await startCheckout(buyer, hallvik, id, ORIGIN), 'checkout');
		const paid = await payOnPage(url, '4242 4242 4242 4242');
		expect(paid.status).toBe(303);
		expect(paid.headers.get('location')).toMatch(
			new RegExp(`/deposits/${id}/paid\\?session_id=cs_test_`)
		);
		await fake.settled();
		const d = await deposit(id);
		expect(d).toMatchObject({ state: 'paid', paidAmount: 'EUR 1,250.00', mismatchReason: null });

		const event = [...fake.store.events.values()].find(
			(e) =>
				e.type === 'checkout.session.completed' &&
				(e.data.object as { metadata: Record<string, string> }).metadata.deposit_id === id
		)!;
		// Redelivered: twice at once, then once more.
		const redeliver = (copies: string) =>
			fetch(`${fake.url}/_fake/events/${event.id}/redeliver`, {
				method: 'POST',
				headers: { authorization: `Bearer ${config.secretKey}` },
				body: new URLSearchParams({ copies })
			});
		expect((await redeliver('2')).status).toBe(202);
		await fake.settled();
		expect((await redeliver('1')).status).toBe(202);
		await fake.settled();
		expect(await events(id, 'checkout.session.completed')).toBe(1);
		expect(await countRows('stripe_events', 'id = :id', { id: event.id })).toBe(1);
		expect((await deposit(id)).version).toBe(d.version);
		expect(
			await countRows('audit_events', "action = 'deposit.paid' AND entity_id = :id", { id })
		).toBe(1);

		// Concurrent deliveries straight to the route: one applies, the others see the id taken.
		const body = JSON.stringify(event);
		const signature = Stripe.webhooks.generateTestHeaderString({
			payload: body,
			secret: config.webhookSecret
		});
		const results = await Promise.all(
			[1, 2, 3].map(async () => (await callWebhook(body, signature)).json())
		);
		expect(results.every((r) => r.duplicate === true)).toBe(true);

		// One request notice and one receipt per customer user, however often the event came.
		expect(await mails('deposit_requested', id)).toEqual(['buyer@hallvik.example']);
		expect(await mails('payment_received', id)).toEqual(['buyer@hallvik.example']);
		const [receipt] = await sequelize.query<{ text: string }>(
			`SELECT text FROM mail_outbox WHERE kind = 'payment_received' AND dedupe_key LIKE :key`,
			{ type: QueryTypes.SELECT, replacements: { key: `payment_received:${id}:%` } }
		);
		expect(receipt!.text).toContain('Amount: EUR 1,250.00');
		expect(receipt!.text).toMatch(/Payment reference: pi_/);
		expect(receipt!.text).toContain(`/shipments/${hallvik}/deposits/${id}/receipt`);
	});

	it('applies a first delivery once when three arrive at the same moment', async () => {
		const id = await newDeposit('88.00');
		const { url } = ok(await startCheckout(buyer, hallvik, id, ORIGIN), 'checkout');
		failNext = 1000; // the fake gives up on every delivery: the event stays unapplied
		await payOnPage(url, '4242424242424242');
		await fake.settled();
		failNext = 0;
		expect((await deposit(id)).state).toBe('requested');
		const event = [...fake.store.events.values()].find(
			(e) =>
				e.type === 'checkout.session.completed' &&
				(e.data.object as { metadata: Record<string, string> }).metadata.deposit_id === id
		)!;
		const body = JSON.stringify(event);
		const signature = signatureHeader(body, config.webhookSecret, Math.floor(Date.now() / 1000));
		const results = await Promise.all(
			[1, 2, 3].map(async () => (await callWebhook(body, signature)).json())
		);
		expect(results.filter((r) => r.duplicate === false)).toHaveLength(1);
		expect(results.filter((r) => r.duplicate === true)).toHaveLength(2);
		expect((await deposit(id)).state).toBe('paid');
		expect(await countRows('stripe_events', 'id = :id', { id: event.id })).toBe(1);
		expect(
			await countRows('audit_events', "action = 'deposit.paid' AND entity_id = :id", { id })
		).toBe(1);
	});

	it('retries a delivery that failed, and applies it once', async () => {
		const id = await newDeposit('75.00');
		const { url } = ok(await startCheckout(buyer, hallvik, id, ORIGIN), 'checkout');
		failNext = 2;
		const before = fake.deliveries.length;
		await payOnPage(url, '4242424242424242');
		await fake.settled();
		const attempts = fake.deliveries.slice(before).filter((x) => x.status === 500);
		expect(attempts.length).toBe(2);
		expect((await deposit(id)).state).toBe('paid');
		expect(await events(id, 'checkout.session.completed')).toBe(1);
	});

	it('answers a bad signature with 400 and changes nothing', async () => {
		const id = await newDeposit('60.00');
		const before = await deposit(id);
		const eventsBefore = await countRows('stripe_events');
		const forged = JSON.stringify({
			id: 'evt_forged0000000000000001',
			object: 'event',
			type: 'checkout.session.completed',
			data: {
				object: {
					id: 'cs_test_forged',
					object: 'checkout.session',
					payment_status: 'paid',
					payment_intent: 'pi_forged',
					amount_total: 6000,
					currency: 'eur',
					metadata: { deposit_id: id }
				}
			}
		});
		const wrongSecret = Stripe.webhooks.generateTestHeaderString({
			payload: forged,
			secret: 'whsec_not_ours'
		});
		for (const signature of [wrongSecret, null, 't=1,v1=00']) {
			const response = await callWebhook(forged, signature);
			expect(response.status).toBe(400);
			expect(await response.json()).toMatchObject({ code: 'bad_signature' });
		}
		// Signed for another body: a changed amount fails too.
		const good = Stripe.webhooks.generateTestHeaderString({
			payload: forged,
			secret: config.webhookSecret
		});
		expect((await callWebhook(forged.replace('6000', '1'), good)).status).toBe(400);
		expect(await countRows('stripe_events')).toBe(eventsBefore);
		expect(await deposit(id)).toEqual(before);
	});

	it('flags a payment whose amount differs, and does not accept it', async () => {
		const id = await newDeposit('300.00');
		const { url } = ok(await startCheckout(buyer, hallvik, id, ORIGIN), 'checkout');
		const response = await fetch(`${fake.url}/_fake/checkout/sessions/${sessionIdOf(url)}/pay`, {
			method: 'POST',
			headers: { authorization: `Bearer ${config.secretKey}` },
			body: new URLSearchParams({ card: '4242424242424242', amount: '29999' })
		});
		expect(response.status).toBe(200);
		await fake.settled();
		const d = await deposit(id);
		expect(d.state).toBe('requested');
		expect(d.mismatchReason).toMatch(/Received EUR 299\.99 where EUR 300\.00 was requested/);
		expect(d).toMatchObject({ canPay: false, canRefund: true, paidAmount: 'EUR 299.99' });
		expect((await listDeposits(buyer, hallvik))!.find((x) => x.id === id)).toMatchObject({
			canPay: false,
			mismatchReason: null
		});
	});

	it('leaves the deposit unpaid after a declined card, with the session still open', async () => {
		const id = await newDeposit('210.00');
		const { url } = ok(await startCheckout(buyer, hallvik, id, ORIGIN), 'checkout');
		const declined = await payOnPage(url, '4000 0000 0000 0002');
		expect(declined.status).toBe(402);
		expect(await declined.text()).toContain('The card was declined');
		await fake.settled();
		const d = await deposit(id);
		expect(d).toMatchObject({ state: 'requested', lastFailure: 'Your card was declined.' });
		expect(await events(id, 'payment_intent.payment_failed')).toBe(1);
		const session = await createStripe(config).checkout.sessions.retrieve(sessionIdOf(url));
		expect(session.status).toBe('open');
		// The same page still takes a good card.
		expect((await payOnPage(url, '4242424242424242')).status).toBe(303);
		await fake.settled();
		expect((await deposit(id)).state).toBe('paid');
	});
});

describe('refunds and cancelling', () => {
	it('refunds a paid deposit through the SDK, once', async () => {
		const id = await newDeposit('500.00');
		const { url } = ok(await startCheckout(buyer, hallvik, id, ORIGIN), 'checkout');
		await payOnPage(url, '4242424242424242');
		await fake.settled();
		const paid = await deposit(id);
		expect(await refundDeposit(coordinator, hallvik, id, paid.version, null)).toMatchObject({
			status: 403
		});
		const { refundId } = ok(
			await refundDeposit(finance, hallvik, id, paid.version, context.ip),
			'refund'
		);
		expect(refundId).toMatch(/^re_/);
		await fake.settled();
		const d = await deposit(id);
		expect(d.state).toBe('refunded');
		const refund = await createStripe(config).refunds.retrieve(refundId);
		expect(refund).toMatchObject({ amount: 50000, currency: 'eur', status: 'succeeded' });
		expect(await events(id, 'refund.created')).toBe(1);
		expect(await events(id, 'charge.refunded')).toBe(1);
		expect(await refundDeposit(finance, hallvik, id, d.version, null)).toMatchObject({
			status: 409
		});
		expect(await mails('deposit_refunded', id)).toEqual(['buyer@hallvik.example']);
		expect(
			await countRows('audit_events', "action = 'deposit.refund' AND entity_id = :id", { id })
		).toBeLessThanOrEqual(1);
	});

	it('cancels a requested deposit and closes its open session; a paid one cannot be cancelled', async () => {
		const id = await newDeposit('40.00');
		const { url } = ok(await startCheckout(buyer, hallvik, id, ORIGIN), 'checkout');
		const d = await deposit(id);
		ok(await cancelDeposit(coordinator, hallvik, id, d.version, null), 'cancel');
		expect((await deposit(id)).state).toBe('cancelled');
		const session = await createStripe(config).checkout.sessions.retrieve(sessionIdOf(url));
		expect(session.status).toBe('expired');
		expect(await startCheckout(buyer, hallvik, id, ORIGIN)).toMatchObject({
			ok: false,
			status: 409
		});
		expect(await cancelDeposit(coordinator, hallvik, id, undefined, null)).toMatchObject({
			status: 409
		});
	});

	it('expires requested deposits past their due date', async () => {
		const id = await newDeposit('20.00');
		await sequelize.query(
			"UPDATE deposits SET due_date = current_date - 1 WHERE id = :id AND state = 'requested'",
			{ replacements: { id } }
		);
		expect(await expirePastDue()).toBeGreaterThanOrEqual(1);
		expect((await deposit(id)).state).toBe('expired');
		expect(await startCheckout(buyer, hallvik, id, ORIGIN)).toMatchObject({
			ok: false,
			status: 409
		});
	});
});
