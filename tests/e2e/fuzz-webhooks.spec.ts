import { randomBytes, randomUUID } from 'node:crypto';
import { expect, test } from '@playwright/test';
import fc from 'fast-check';
import { closeDatabase, rows } from './database';
import { DatabaseFingerprint, changedTables } from './db-fingerprint';
import { deliverSigned } from './signed-webhook';
import { ONLY, RUNS, SEED } from './fuzz-settings';
import { leafPaths, setPath, type Json } from './fuzz-json-paths';

// Correctly signed but hostile webhook events (issue 9): the signature is right, so only the
// event's own checks stand between it and the deposits. Each case takes one of Landfall's event
// types (and one it does not use), changes one field to a hostile value or drops it, signs it
// with the e2e secret and delivers it. Asserts: never a 5xx; a 400 is `invalid_event` naming the
// changed field (or a field below it); a 200 applied nothing to a deposit (the bases name no
// deposit, or a real one whose session is not paid); and at the end only stripe_events, where
// each accepted event id is recorded once by design (deposit-events.ts), differs. Replays of one
// event id answer `duplicate`. FUZZ_SEED / FUZZ_RUNS / FUZZ_ONLY as in fuzz.spec.ts.

const suffix = () => randomBytes(8).toString('hex');

function event(type: string, object: Record<string, Json>): Record<string, Json> {
	return {
		id: `evt_fuzz_${suffix()}`,
		object: 'event',
		type,
		created: Math.floor(Date.now() / 1000),
		livemode: false,
		data: { object }
	};
}

/** One base per event type: none of them may change a deposit, whatever is changed below. */
function bases(deposit: { id: string; amount: number; currency: string }) {
	const session = (depositId: string, status: string) => ({
		id: `cs_fuzz_${suffix()}`,
		object: 'checkout.session',
		metadata: { deposit_id: depositId },
		payment_status: status,
		payment_intent: `pi_fuzz_${suffix()}`,
		amount_total: deposit.amount,
		currency: deposit.currency.toLowerCase()
	});
	return {
		'completed, no such deposit': () =>
			event('checkout.session.completed', session(randomUUID(), 'paid')),
		'completed, real deposit, unpaid': () =>
			event('checkout.session.completed', session(deposit.id, 'unpaid')),
		'expired, no such deposit': () =>
			event('checkout.session.expired', session(randomUUID(), 'unpaid')),
		'payment failed, no such deposit': () =>
			event('payment_intent.payment_failed', {
				id: `pi_fuzz_${suffix()}`,
				object: 'payment_intent',
				metadata: { deposit_id: randomUUID() },
				last_payment_error: { message: 'Your card was declined.' }
			}),
		'refund, no such payment': () =>
			event('refund.created', {
				id: `re_fuzz_${suffix()}`,
				object: 'refund',
				payment_intent: `pi_fuzz_${suffix()}`,
				status: 'succeeded',
				amount: deposit.amount,
				currency: deposit.currency.toLowerCase()
			}),
		'charge refunded, no such payment': () =>
			event('charge.refunded', {
				id: `ch_fuzz_${suffix()}`,
				object: 'charge',
				payment_intent: `pi_fuzz_${suffix()}`
			}),
		'a type Landfall does not use': () =>
			event('invoice.paid', { id: `in_fuzz_${suffix()}`, object: 'invoice' })
	};
}

/** Values Stripe never sends where these fields are. */
const hostile: fc.Arbitrary<Json | undefined> = fc.oneof(
	fc.constantFrom<Json | undefined>(
		undefined, // the field left out
		null,
		'',
		'nul\u0000inside',
		'x'.repeat(6_000),
		-1,
		1.5,
		2 ** 60,
		'12.50',
		'abc',
		true,
		[],
		{},
		{ id: 42 },
		[1, 2, 3],
		'evt_',
		'not-a-uuid',
		'00000000-0000-0000-0000-000000000000',
		"'; DROP TABLE deposits; --",
		'<script>alert(1)</script>',
		{ nested: { deeper: { deepest: Array.from({ length: 50 }, (_, i) => i) } } }
	),
	fc.integer(),
	fc.string({ maxLength: 12 })
);

const related = (issue: string, changed: string) =>
	issue === changed || issue.startsWith(`${changed}.`) || changed.startsWith(`${issue}.`);

let fingerprint: DatabaseFingerprint;
type Fixture = { id: string; amount: string; currency: string };
let real: Fixture | undefined;

// This file's own requested deposit with a session that is never paid (the demo seeds none, and
// the deposits spec's may be paid by the time this runs); removed with its events at the end.
test.beforeAll(async () => {
	[real] = await rows<Fixture>(
		`INSERT INTO deposits (shipment_id, organization_id, amount_minor, currency, basis, due_date,
			note, checkout_session_id)
		SELECT id, customer_id, 71500, 'EUR', 'amount', current_date + 14, 'fuzz-webhooks fixture',
			'cs_fuzz_fixture_' || md5(random()::text)
		FROM shipments ORDER BY reference LIMIT 1
		RETURNING id, amount_minor::text AS amount, currency`
	);
	fingerprint = new DatabaseFingerprint();
	await fingerprint.open();
});

test.afterAll(async () => {
	await fingerprint?.close();
	if (real) {
		await rows('DELETE FROM stripe_events WHERE deposit_id = $1', [real.id]);
		await rows('DELETE FROM deposits WHERE id = $1', [real.id]);
	}
	await closeDatabase();
});

test('signed hostile webhook events: never a 5xx, no deposit changed', async ({ baseURL }) => {
	test.skip(ONLY !== '' && !'webhooks'.includes(ONLY), `FUZZ_ONLY=${ONLY}`);
	test.setTimeout(120_000);
	if (!real) throw new Error('the fixture deposit was not made');
	const kinds = bases({ id: real.id, amount: Number(real.amount), currency: real.currency });
	const names = Object.keys(kinds) as (keyof typeof kinds)[];
	const deliver = (payload: string) => deliverSigned(baseURL!, payload);

	const before = await fingerprint.take();
	// Each base as it is: accepted (recorded), and its replay is a duplicate that changes nothing.
	for (const name of names) {
		const payload = JSON.stringify(kinds[name]());
		const first = await deliver(payload);
		expect(first.status, `${name}: ${await first.clone().text()}`).toBe(200);
		const again = (await (await deliver(payload)).json()) as { duplicate?: boolean };
		expect(again.duplicate, `${name} replayed`).toBe(true);
	}

	const statuses: Record<number, number> = {};
	await fc.assert(
		fc.asyncProperty(fc.constantFrom(...names), fc.nat(), hostile, async (name, pick, leaf) => {
			const base = kinds[name]() as Json;
			const paths = leafPaths(base);
			const path = paths[pick % paths.length]!;
			const changed = path.map(String).join('.');
			const payload = JSON.stringify(setPath(base, path, leaf));
			const response = await deliver(payload);
			const status = response.status;
			statuses[status] = (statuses[status] ?? 0) + 1;
			const text = await response.text();
			const what = `${name}: ${changed} = ${JSON.stringify(leaf === undefined ? 'dropped' : leaf)?.slice(0, 60)} → ${status} ${text.slice(0, 300)}`;
			expect([200, 400], what).toContain(status);
			const body = JSON.parse(text) as { code?: string; issues?: { path: string }[] };
			if (status === 400) {
				expect(body.code, what).toBe('invalid_event');
				const issues = (body.issues ?? []).map((i) => i.path);
				expect(
					issues.some((p) => related(p, changed)),
					`${what}: issues ${issues}`
				).toBe(true);
			}
		}),
		{ seed: SEED, numRuns: RUNS * 4, endOnFailure: true }
	);
	console.log(`fuzz-webhooks: statuses ${JSON.stringify(statuses)}`);
	expect(
		changedTables(before, await fingerprint.take()),
		'only the received event ids are recorded'
	).toEqual(['stripe_events']);
});
