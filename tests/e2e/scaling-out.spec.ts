import { randomBytes } from 'node:crypto';
import { expect, test, type APIRequestContext } from '@playwright/test';
import { closeDatabase, rows } from './database';
import { DEMO, apiAs } from './helpers';
import { deliverSigned } from './signed-webhook';

// Two app processes against one database (playwright.config.ts starts both): Landfall keeps no
// state in its processes, so requests may go to either. Requests alternate between them here.
// Checked: a session from one is valid on the other; 50 papers issued in parallel across both get
// unique, gap-free numbers; a stale edit on one process is refused with a clear 409 when the other
// saved first; a Stripe webhook delivered to both at once is applied once.

test.describe.configure({ mode: 'serial' });
test.setTimeout(180_000);

const B = `http://127.0.0.1:${process.env.E2E_PORT_B ?? Number(process.env.E2E_PORT ?? 4390) + 1}`;
const PARALLEL_ISSUES = 50;

let A = '';
let coordinator: APIRequestContext;
let finance: APIRequestContext;
const header: Record<string, unknown> = {};
const products: string[] = [];
const shipments: string[] = [];

/** The two processes in turn: even → A, odd → B. */
const origin = (i: number) => (i % 2 === 0 ? A : B);

async function postAction(
	client: APIRequestContext,
	base: string,
	path: string,
	form: Record<string, string>
) {
	const response = await client.post(`${base}${path}`, {
		form,
		headers: { origin: base, 'x-sveltekit-action': 'true', accept: 'application/json' }
	});
	const body = (await response.json()) as { type: string; status?: number; data?: string };
	expect(body.type, `${path} on ${base}: ${JSON.stringify(body).slice(0, 400)}`).toBe('success');
}

const versionOf = async (id: string) =>
	(await rows<{ version: number }>('SELECT version FROM shipments WHERE id = $1', [id]))[0]!
		.version;

/** A booked Hallvik shipment with two lines and the papers' details, made through process `i`. */
async function bookedShipment(i: number): Promise<string> {
	const base = origin(i);
	const created = await coordinator.post(`${base}/api/v1/shipments`, {
		data: { ...header, notes: `Scaling-out test ${i}` }
	});
	expect(created.status(), await created.text()).toBe(201);
	const { id } = (await created.json()) as { id: string };
	const lines = [
		{ productId: products[0], quantity: 12 + i, unitPrice: '' },
		{ productId: products[1], quantity: 5, unitPrice: '' }
	];
	const put = await coordinator.put(`${base}/api/v1/shipments/${id}/lines`, {
		data: { lines, version: await versionOf(id) }
	});
	expect(put.status(), await put.text()).toBe(200);
	await postAction(coordinator, origin(i + 1), `/shipments/${id}?/papers`, {
		paymentTerms: '30 days net',
		exportReason: 'Sale',
		signatoryName: 'Ilse Marant',
		signatoryTitle: 'Export coordinator',
		signingPlace: 'Penang',
		version: String(await versionOf(id))
	});
	await postAction(coordinator, base, `/shipments/${id}?/status`, {
		to: 'booked',
		note: '',
		version: String(await versionOf(id))
	});
	return id;
}

test.beforeAll(async ({ baseURL }) => {
	A = baseURL!;
	coordinator = await apiAs(A, DEMO.coordinator);
	finance = await apiAs(B, DEMO.finance);
	const [ids] = await Promise.all([
		rows<{ customer: string; consignee: string; origin: string; destination: string }>(
			`SELECT (SELECT id FROM organizations WHERE name = 'Hallvik Heimtechnik GmbH') AS customer,
			        (SELECT id FROM parties WHERE name = 'Hallvik Heimtechnik GmbH — Distribution centre') AS consignee,
			        (SELECT id FROM places WHERE code = 'MYPKG') AS origin,
			        (SELECT id FROM places WHERE code = 'DEHAM') AS destination`
		)
	]);
	Object.assign(header, {
		customerId: ids[0]!.customer,
		consigneeId: ids[0]!.consignee,
		incoterm: 'FCA',
		incotermPlace: 'Port Klang',
		originId: ids[0]!.origin,
		destinationId: ids[0]!.destination,
		modesConsidered: ['sea_fcl'],
		chosenMode: 'sea_fcl',
		currency: 'EUR'
	});
	for (const sku of ['SLV-PBL-20', 'SLV-TWR-80']) {
		products.push(
			(await rows<{ id: string }>('SELECT id FROM products WHERE sku = $1', [sku]))[0]!.id
		);
	}
});

test.afterAll(async () => {
	await coordinator.dispose();
	await finance.dispose();
	await closeDatabase();
});

test('a session made on one process is valid on the other', async () => {
	for (const base of [A, B]) {
		const me = await coordinator.get(`${base}/api/v1/me`);
		expect(me.status()).toBe(200);
		expect(((await me.json()) as { email: string }).email).toBe(DEMO.coordinator);
	}
});

test(`${PARALLEL_ISSUES} papers issued at once across both processes get unique, gap-free numbers`, async () => {
	// Made ten at a time, half through each process.
	for (let start = 0; start < PARALLEL_ISSUES; start += 10) {
		const batch = Array.from({ length: 10 }, (_, k) => bookedShipment(start + k));
		shipments.push(...(await Promise.all(batch)));
	}
	const answers = await Promise.all(
		shipments.map((id, i) =>
			coordinator.post(`${origin(i)}/api/v1/shipments/${id}/documents`, {
				data: { kinds: ['commercial_invoice'], reason: '' }
			})
		)
	);
	for (const answer of answers) expect(answer.status(), await answer.text()).toBeLessThan(300);

	const mine = await rows<{ number: string; sequence: number }>(
		`SELECT number, sequence FROM shipment_documents
		  WHERE shipment_id = ANY($1::uuid[]) AND kind = 'commercial_invoice'`,
		[shipments]
	);
	expect(mine).toHaveLength(PARALLEL_ISSUES);
	expect(new Set(mine.map((d) => d.number)).size).toBe(PARALLEL_ISSUES);
	// Gap-free over every invoice of this exporter and year, whoever issued them (other specs run
	// alongside, so a transaction of theirs may still be open: look again briefly).
	await expect(async () => {
		const all = await rows<{ exporter_id: string; year: number; sequence: number; n: string }>(
			`SELECT d.exporter_id, d.year, d.sequence, count(DISTINCT d.number) AS n
			   FROM shipment_documents d
			  WHERE d.kind = 'commercial_invoice'
			    AND (d.exporter_id, d.year) IN (SELECT exporter_id, year FROM shipment_documents
			                                     WHERE shipment_id = ANY($1::uuid[]))
			  GROUP BY d.exporter_id, d.year, d.sequence ORDER BY d.sequence`,
			[shipments]
		);
		expect(
			all.every((r) => r.n === '1'),
			'one number per sequence'
		).toBe(true);
		expect(
			all.map((r) => r.sequence),
			'sequences 1…n'
		).toEqual(all.map((_, k) => k + 1));
		const [counter] = await rows<{ last_sequence: number }>(
			`SELECT last_sequence FROM document_counters
			  WHERE kind = 'commercial_invoice' AND exporter_id = $1 AND year = $2`,
			[all[0]!.exporter_id, all[0]!.year]
		);
		expect(counter!.last_sequence).toBe(all.length);
	}).toPass({ timeout: 10_000 });
});

test('a stale edit on one process is refused with a clear 409 when the other saved first', async () => {
	const id = await bookedShipment(0); // one without papers: issued ones refuse header edits
	const version = await versionOf(id);
	const edit = (base: string, carrier: string) =>
		coordinator.patch(`${base}/api/v1/shipments/${id}`, {
			data: { ...header, carrier, version }
		});
	const [first, second] = await Promise.all([edit(A, 'Carrier A'), edit(B, 'Carrier B')]);
	const statuses = [first.status(), second.status()].sort();
	expect(statuses, `${await first.text()} | ${await second.text()}`).toEqual([200, 409]);
	const refused = first.status() === 409 ? first : second;
	const body = (await refused.json()) as { message: string };
	expect(body.message).toMatch(/changed|reload/i);
	expect(await versionOf(id)).toBe(version + 1);
});

test('a Stripe webhook delivered to both processes at once is applied once', async () => {
	const id = shipments[1] ?? (await bookedShipment(1));
	const note = `Scaling-out deposit ${Date.now()}`;
	await postAction(finance, B, `/shipments/${id}?/requestDeposit`, {
		basis: 'amount',
		amount: '250.00',
		percent: '',
		currency: 'EUR',
		dueDate: new Date(Date.now() + 14 * 86_400_000).toISOString().slice(0, 10),
		note
	});
	const [deposit] = await rows<{ id: string; amount_minor: string; currency: string }>(
		'SELECT id, amount_minor::text, currency FROM deposits WHERE shipment_id = $1 AND note = $2',
		[id, note]
	);
	expect(deposit).toBeDefined();
	const suffix = randomBytes(8).toString('hex');
	const payload = JSON.stringify({
		id: `evt_scale_${suffix}`,
		object: 'event',
		type: 'checkout.session.completed',
		created: Math.floor(Date.now() / 1000),
		livemode: false,
		data: {
			object: {
				id: `cs_test_scale_${suffix}`,
				object: 'checkout.session',
				metadata: { deposit_id: deposit!.id },
				payment_status: 'paid',
				payment_intent: `pi_scale_${suffix}`,
				amount_total: Number(deposit!.amount_minor),
				currency: deposit!.currency.toLowerCase()
			}
		}
	});
	const deliver = (base: string) => deliverSigned(base, payload);
	const answers = await Promise.all([deliver(A), deliver(B)]);
	const bodies = (await Promise.all(answers.map((a) => a.json()))) as { duplicate: boolean }[];
	expect(answers.map((a) => a.status)).toEqual([200, 200]);
	expect(bodies.map((b) => b.duplicate).sort()).toEqual([false, true]);
	// Stripe's own retry later changes nothing either.
	const again = (await (await deliver(A)).json()) as { duplicate: boolean };
	expect(again.duplicate).toBe(true);

	const [state] = await rows<{ state: string; payment_intent_id: string }>(
		'SELECT state, payment_intent_id FROM deposits WHERE id = $1',
		[deposit!.id]
	);
	expect(state).toEqual({ state: 'paid', payment_intent_id: `pi_scale_${suffix}` });
	const [audit] = await rows<{ n: string }>(
		"SELECT count(*) AS n FROM audit_events WHERE entity_id = $1 AND action = 'deposit.paid'",
		[deposit!.id]
	);
	expect(audit!.n).toBe('1');
});
