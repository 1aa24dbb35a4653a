// The payment provider unreachable mid-run: the local Stripe fake (scripts/stripe-fake) is stopped
// and started again on the same port, keeping what it knew, as Stripe would. Landfall must refuse
// cleanly while it is down (no state change), and afterwards do the work exactly once: every POST
// it makes carries its own idempotency key, and every webhook event id is applied once.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { SessionUser } from '$lib/server/auth/session-user';
import { Shipment } from '$lib/server/db/models';
import { usePayments, type StripeConfig } from '$lib/server/payments/stripe-client';
import {
	listDeposits,
	refundDeposit,
	requestDeposit,
	startCheckout
} from '$lib/server/services/deposits';
import { depositRequestSchema } from '$lib/schemas/deposits';
import { startStripeFake, type StripeFake } from '../../scripts/stripe-fake/app';
import { Store } from '../../scripts/stripe-fake/objects';
import { sessionUserFor } from './db';
import { startWebhookReceiver, type WebhookReceiver } from './webhook-receiver';
import { deleteDeposits } from './deposit-cleanup';
import { ok } from './service-results';

const ORIGIN = 'http://127.0.0.1:4998';
const context = { origin: ORIGIN, ip: '198.51.100.91' }; // RFC 5737 TEST-NET-2
const store = new Store();
let fake: StripeFake | null = null;
let fakePort = 0;
let receiver: WebhookReceiver | undefined;
let receiverUrl = '';
let config: StripeConfig;
let finance: SessionUser;
let buyer: SessionUser;
let hallvik = '';
const created: string[] = [];

/** Starts the fake on its port (a free one the first time), with the same store each time. */
async function startFake() {
	fake = await startStripeFake({
		port: fakePort,
		apiKey: 'sk_test_landfall_faults',
		webhookSecret: 'whsec_landfall_faults',
		webhookUrl: receiverUrl,
		retryBaseMs: 20,
		maxAttempts: 5,
		store
	});
	fakePort = fake.port;
}

async function stopFake() {
	await fake?.close();
	fake = null;
}

const deposit = async (id: string) =>
	(await listDeposits(finance, hallvik))!.find((d) => d.id === id)!;

beforeAll(async () => {
	receiver = await startWebhookReceiver(ORIGIN);
	receiverUrl = receiver.url;
	await startFake();
	config = {
		secretKey: 'sk_test_landfall_faults',
		webhookSecret: 'whsec_landfall_faults',
		host: '127.0.0.1',
		port: fakePort,
		protocol: 'http'
	};
	usePayments(config);
	[finance, buyer] = await Promise.all([
		sessionUserFor('finance@solvrae.example'),
		sessionUserFor('buyer@hallvik.example')
	]);
	const all = await Shipment.findAll({ attributes: ['id', 'notes'] });
	hallvik = all.find((s) => s.notes === 'Demo scenario: hallvik-speakers')!.id;
});

afterAll(async () => {
	await stopFake();
	await receiver?.close();
	await deleteDeposits(created);
});

describe('the payment provider stopped mid-run', () => {
	it('refuses a payment cleanly while it is down, then takes it once when it is back', async () => {
		const input = depositRequestSchema.parse({
			basis: 'amount',
			amount: '321.00',
			currency: 'EUR',
			dueDate: new Date(Date.now() + 7 * 86_400_000).toISOString().slice(0, 10)
		});
		const { id } = ok(await requestDeposit(finance, hallvik, input, context), 'request');
		created.push(id);
		const before = await deposit(id);

		await stopFake();
		const refused = await startCheckout(buyer, hallvik, id, ORIGIN);
		expect(refused).toMatchObject({ ok: false, status: 502 });
		expect(refused.ok ? '' : refused.message).toMatch(/payment provider/);
		expect(await deposit(id)).toEqual(before); // nothing half-done

		await startFake();
		const { url } = ok(await startCheckout(buyer, hallvik, id, ORIGIN), 'checkout after restart');
		expect(ok(await startCheckout(buyer, hallvik, id, ORIGIN), 'again').url).toBe(url); // reused
		const paid = await fetch(url, {
			method: 'POST',
			redirect: 'manual',
			headers: { 'content-type': 'application/x-www-form-urlencoded' },
			body: new URLSearchParams({ card: '4242 4242 4242 4242', expiry: '12/30', cvc: '123' })
		});
		expect(paid.status).toBe(303);
		await fake!.settled();
		expect(await deposit(id)).toMatchObject({ state: 'paid', paidAmount: 'EUR 321.00' });
		const sessions = [...store.sessions.values()].filter((s) => s.metadata.deposit_id === id);
		expect(sessions).toHaveLength(1);

		// A refund while the provider is down: refused, the deposit stays paid; once it is back the
		// refund is made once, and a second click finds it refunded.
		const paidDeposit = await deposit(id);
		await stopFake();
		const notYet = await refundDeposit(finance, hallvik, id, paidDeposit.version, context.ip);
		expect(notYet).toMatchObject({ ok: false, status: 502 });
		expect((await deposit(id)).state).toBe('paid');

		await startFake();
		ok(
			await refundDeposit(finance, hallvik, id, paidDeposit.version, context.ip),
			'refund after restart'
		);
		await fake!.settled();
		const again = await refundDeposit(finance, hallvik, id, undefined, context.ip);
		expect(again).toMatchObject({ ok: false, status: 409 });
		expect((await deposit(id)).state).toBe('refunded');
		const intent = sessions[0]!.payment_intent;
		const refunds = [...store.refunds.values()].filter((r) => r.payment_intent === intent);
		expect(refunds).toHaveLength(1);
	});
});
