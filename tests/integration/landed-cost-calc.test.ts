// The stateless landed-cost route against the stored-shipment route: for the demo Hallvik
// shipment, the input that `shipmentLandedCostInput` gathers, sent as JSON to
// POST /api/v1/calc/landed-cost, gives exactly the figures of GET /shipments/{id}/landed-cost.
// Both route handlers are called directly with the event fields they read.
import { isHttpError } from '@sveltejs/kit';
import { beforeAll, describe, expect, it } from 'vitest';
import type { TransportMode } from '$lib/landed-cost';
import type { SessionUser } from '$lib/server/auth/session-user';
import { Shipment } from '$lib/server/db/models';
import { shipmentLandedCostInput } from '$lib/server/services/landed-cost/input';
import { POST } from '../../src/routes/api/v1/calc/landed-cost/+server';
import { GET } from '../../src/routes/api/v1/shipments/[shipmentId=uuid]/landed-cost/+server';
import { sessionUserFor } from './db';

type Answer = { status: number; body: Record<string, unknown> };

/** A handler's JSON answer, or the status and body of the error it threw. */
async function answer(run: () => Response | Promise<Response>): Promise<Answer> {
	try {
		const response = await run();
		return { status: response.status, body: await response.json() };
	} catch (e) {
		if (isHttpError(e))
			return { status: e.status, body: e.body as unknown as Record<string, unknown> };
		throw e;
	}
}

const BASE = 'http://127.0.0.1';

function postCalc(user: SessionUser, body: string): Promise<Answer> {
	const url = new URL(`${BASE}/api/v1/calc/landed-cost`);
	const request = new Request(url, {
		method: 'POST',
		headers: { 'content-type': 'application/json' },
		body
	});
	return answer(() => POST({ locals: { user }, url, request } as Parameters<typeof POST>[0]));
}

function getStored(user: SessionUser, shipmentId: string, query: string): Promise<Answer> {
	const url = new URL(`${BASE}/api/v1/shipments/${shipmentId}/landed-cost?${query}`);
	return answer(() =>
		GET({ locals: { user }, url, params: { shipmentId } } as Parameters<typeof GET>[0])
	);
}

let finance: SessionUser;
let broker: SessionUser;
let shipmentId: string;
const date = new Date().toISOString().slice(0, 10);

beforeAll(async () => {
	[finance, broker] = await Promise.all([
		sessionUserFor('finance@solvrae.example'),
		sessionUserFor('broker@kaaiman.example')
	]);
	const demo = await Shipment.findOne({ where: { notes: 'Demo scenario: hallvik-speakers' } });
	if (!demo) throw new Error('The demo Hallvik shipment is missing: is the database seeded?');
	shipmentId = demo.id;
});

describe('POST /api/v1/calc/landed-cost', () => {
	it.each<TransportMode>(['sea_lcl', 'air', 'sea_fcl'])(
		'gives the stored-shipment route’s figures for the demo Hallvik shipment (%s)',
		async (mode) => {
			const stored = await getStored(finance, shipmentId, `mode=${mode}&date=${date}`);
			const gathered = await shipmentLandedCostInput(finance, shipmentId, mode, { date });
			if (!gathered.ok) throw new Error(`${mode}: ${gathered.message}`);
			const calc = await postCalc(finance, JSON.stringify(gathered.input));
			// The demo data covers these three modes of the lane (seeders/demo-landed-cost.ts).
			expect(stored.status).toBe(200);
			expect(calc.status).toBe(200);
			const { shipmentId: id, reference, ...figures } = stored.body;
			expect(id).toBe(shipmentId);
			expect(reference).toMatch(/^SHP-\d{4}-\d{5}$/);
			expect(calc.body).toEqual(figures);
			expect(calc.body.mode).toBe(mode);
			expect((calc.body.perLine as unknown[]).length).toBe(gathered.input.lines.length);
		}
	);

	it('answers 400 with field paths for malformed input, 422 with the engine’s list', async () => {
		const gathered = await shipmentLandedCostInput(finance, shipmentId, 'sea_lcl', { date });
		if (!gathered.ok) throw new Error(gathered.message);
		const bad = structuredClone(gathered.input);
		bad.lines[1]!.unitPrice = 'twelve';
		const refused = await postCalc(finance, JSON.stringify(bad));
		expect(refused.status).toBe(400);
		expect(refused.body.code).toBe('invalid_body');
		expect(refused.body.issues).toEqual([expect.objectContaining({ path: 'lines.1.unitPrice' })]);

		expect((await postCalc(finance, '{"date":')).status).toBe(400);

		const expired = structuredClone(gathered.input);
		expired.date = '1999-01-04'; // before every demo row starts
		const missing = await postCalc(finance, JSON.stringify(expired));
		expect(missing.status).toBe(422);
		expect(missing.body.code).toBe('missing_data');
		expect((missing.body.issues as { path: string }[]).map((i) => i.path)).toContain('rateCard');
	});

	it('is for staff who see landed cost: a broker is refused', async () => {
		const gathered = await shipmentLandedCostInput(finance, shipmentId, 'sea_lcl', { date });
		if (!gathered.ok) throw new Error(gathered.message);
		const refused = await postCalc(broker, JSON.stringify(gathered.input));
		expect(refused.status).toBe(403);
	});
});
