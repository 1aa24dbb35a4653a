import { expect, test, type APIRequestContext } from '@playwright/test';
import { rows, closeDatabase } from './database';
import { DEMO, apiAs } from './helpers';
import { parseActionResult, type ActionResult } from './superform-data';

// A real deposit's id used out of its place (issue 9, no guessable-id access): finance requests
// a deposit on Hallvik's shipment through the form action; then every deposit action, page and
// API route is tried with that real id by each role, on Hallvik's shipment and on another
// organization's. Only Hallvik's buyer (and staff, on the right shipment) reach it; every other
// attempt is a 403 or 404 and leaves the deposit exactly as it was (no Checkout Session made).

let hallvik = '';
let wattlebird = '';
let depositId = '';
const clients: Partial<Record<keyof typeof DEMO, APIRequestContext>> = {};

const as = async (baseURL: string, who: keyof typeof DEMO) =>
	(clients[who] ??= await apiAs(baseURL, DEMO[who]));

/** Posts a form action as the page's enhance would, and returns its action result. */
async function action(
	client: APIRequestContext,
	shipmentId: string,
	name: string,
	form: Record<string, string>
): Promise<ActionResult> {
	const response = await client.post(`/shipments/${shipmentId}?/${name}`, {
		form,
		headers: { 'x-sveltekit-action': 'true', accept: 'application/json' }
	});
	expect(response.status(), `${name} answers its result as JSON`).toBeLessThan(500);
	return parseActionResult(await response.text());
}

const depositRow = async () =>
	(
		await rows(
			`SELECT state, version, checkout_session_id, payment_intent_id, refund_id, updated_at::text
			   FROM deposits WHERE id = $1`,
			[depositId]
		)
	)[0];

test.beforeAll(async ({ baseURL }) => {
	const admin = await as(baseURL!, 'admin');
	const list = await (await admin.get('/api/v1/shipments?pageSize=100')).json();
	const of = (name: string) =>
		list.rows.find((r: { customerName: string }) => r.customerName.startsWith(name)).id as string;
	hallvik = of('Hallvik');
	wattlebird = of('Wattlebird');
	const note = `scoping ${Date.now()}`;
	const requested = await action(await as(baseURL!, 'finance'), hallvik, 'requestDeposit', {
		basis: 'amount',
		amount: '321.00',
		currency: 'EUR',
		dueDate: new Date(Date.now() + 14 * 86_400_000).toISOString().slice(0, 10),
		note
	});
	expect(requested.type, JSON.stringify(requested)).toBe('success');
	const finance = await as(baseURL!, 'finance');
	const { deposits } = await (await finance.get(`/api/v1/shipments/${hallvik}/deposits`)).json();
	depositId = deposits.find((d: { note: string | null }) => d.note === note).id;
	expect(depositId).toMatch(/^[0-9a-f-]{36}$/);
});

test.afterAll(async () => {
	await Promise.all(Object.values(clients).map((c) => c.dispose()));
	await closeDatabase();
});

test('a real deposit id works only on its own shipment and for its own customer', async ({
	baseURL
}) => {
	const before = await depositRow();
	const form = () => ({ depositId, version: String(before!.version) });
	const notFound = async (
		who: keyof typeof DEMO,
		shipmentId: string,
		name: string,
		status = 404
	) => {
		const result = await action(await as(baseURL!, who), shipmentId, name, form());
		expect(
			result,
			`${who} ${name} on ${shipmentId === hallvik ? 'its' : 'another'} shipment`
		).toMatchObject({ type: 'failure', status });
	};
	// Actions with the real id: out of place for everyone, or not this role's.
	await notFound('otherCustomer', wattlebird, 'payDeposit');
	await notFound('otherCustomer', hallvik, 'payDeposit');
	await notFound('customer', wattlebird, 'payDeposit');
	await notFound('coordinator', wattlebird, 'cancelDeposit');
	await notFound('finance', wattlebird, 'cancelDeposit');
	await notFound('finance', wattlebird, 'refundDeposit');
	for (const name of ['payDeposit', 'cancelDeposit', 'refundDeposit']) {
		const response = await (
			await as(baseURL!, 'broker')
		).post(`/shipments/${hallvik}?/${name}`, {
			form: form(),
			headers: { 'x-sveltekit-action': 'true', accept: 'application/json' }
		});
		expect(response.status(), `broker ${name}`).toBe(403);
	}
	// Pages and API with the real id.
	for (const page of ['paid', 'not-paid', 'receipt']) {
		for (const [who, shipmentId] of [
			['otherCustomer', hallvik],
			['otherCustomer', wattlebird],
			['customer', wattlebird],
			['broker', hallvik],
			['finance', wattlebird]
		] as const) {
			const response = await (
				await as(baseURL!, who)
			).get(`/shipments/${shipmentId}/deposits/${depositId}/${page}`);
			expect(response.status(), `${who} ${page} page`).toBe(404);
			expect(await response.text()).not.toContain(depositId);
		}
	}
	const list = async (who: keyof typeof DEMO, shipmentId: string) =>
		(await as(baseURL!, who)).get(`/api/v1/shipments/${shipmentId}/deposits`);
	expect((await list('otherCustomer', hallvik)).status()).toBe(404);
	expect((await list('broker', hallvik)).status()).toBe(403);
	const foreign = await (await list('otherCustomer', wattlebird)).json();
	expect(JSON.stringify(foreign)).not.toContain(depositId);
	expect(await depositRow(), 'nothing above changed the deposit').toEqual(before);

	// The same id in its place: Hallvik's buyer sees it and may pay; staff cancel it.
	const own = await (await list('customer', hallvik)).json();
	expect(own.deposits.map((d: { id: string }) => d.id)).toContain(depositId);
	const mine = await (
		await as(baseURL!, 'customer')
	).get(`/shipments/${hallvik}/deposits/${depositId}/not-paid`);
	expect(mine.status()).toBe(200);
	const pay = await action(await as(baseURL!, 'customer'), hallvik, 'payDeposit', form());
	expect(pay, 'the buyer is sent to the payment page').toMatchObject({ type: 'redirect' });
	const paying = await depositRow();
	const cancel = await action(await as(baseURL!, 'coordinator'), hallvik, 'cancelDeposit', {
		depositId,
		version: String(paying!.version)
	});
	expect(cancel, JSON.stringify(cancel)).toMatchObject({ type: 'success' });
	expect((await depositRow())!.state).toBe('cancelled');
});
