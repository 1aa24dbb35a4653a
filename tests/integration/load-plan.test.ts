// The load-plan service against the real database: input from a stored shipment, scope, the
// worker, and the cache per shipment revision and planner input. The shipments are this file's
// own (deleted again at the end); demo shipments are only read.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { validatePlan } from '$lib/load-plan';
import type { SessionUser } from '$lib/server/auth/session-user';
import { Place, Product, Shipment, ShipmentLoadPlan } from '$lib/server/db/models';
import {
	prepareLoadPlan,
	shipmentLoadPlan,
	type LoadPlanOutcome
} from '$lib/server/services/load-plan';
import { keptShipmentMeasure } from '$lib/server/services/shipment-measure';
import { createShipment, replaceLines } from '$lib/server/services/shipments';
import { shipmentSchema } from '$lib/schemas/shipments';
import { countRows, demoOrganization, sequelize, sessionUserFor } from './db';

let coordinator: SessionUser;
let hallvikBuyer: SessionUser;
let wattlebirdBuyer: SessionUser;
const created = new Set<string>();
let shipmentId = '';

afterAll(async () => {
	if (created.size > 0) await Shipment.destroy({ where: { id: [...created] } });
});

function plan(outcome: LoadPlanOutcome) {
	if (!outcome.ok) throw new Error(`Refused: ${JSON.stringify(outcome)}`);
	return outcome.value;
}

async function setLines(lines: [string, number][]) {
	const shipment = await Shipment.findByPk(shipmentId, { rejectOnEmpty: true });
	const rows = [];
	for (const [sku, quantity] of lines) {
		const p = await Product.findOne({ where: { sku }, rejectOnEmpty: true });
		rows.push({ productId: p.id, quantity, unitPrice: '' });
	}
	const saved = await replaceLines(
		coordinator,
		shipmentId,
		{ lines: rows, version: shipment.version },
		null
	);
	if (!saved.ok) throw new Error(saved.message);
}

beforeAll(async () => {
	[coordinator, hallvikBuyer, wattlebirdBuyer] = await Promise.all([
		sessionUserFor('coordinator@solvrae.example'),
		sessionUserFor('buyer@hallvik.example'),
		sessionUserFor('buyer@wattlebird.example')
	]);
	const place = async (code: string) =>
		(await Place.findOne({ where: { code }, rejectOnEmpty: true })).id;
	const result = await createShipment(
		coordinator,
		shipmentSchema.parse({
			customerId: (await demoOrganization('hallvik')).id,
			incoterm: 'FOB',
			incotermPlace: 'Port Klang',
			originId: await place('MYPKG'),
			destinationId: await place('DEHAM'),
			modesConsidered: ['sea_fcl'],
			chosenMode: 'sea_fcl',
			currency: 'USD'
		}),
		null
	);
	if (!result.ok) throw new Error(result.message);
	shipmentId = result.value.id;
	created.add(shipmentId);
});

describe('shipmentLoadPlan', () => {
	it('refuses a shipment without lines with a reason, not a plan', async () => {
		const outcome = await shipmentLoadPlan(coordinator, shipmentId);
		expect(outcome).toMatchObject({ ok: false, status: 409, code: 'no_lines' });
	});

	it('plans the cartons in a worker, keeps every rule, and caches the plan', async () => {
		// 120 power-bank cartons (1440 ÷ 12 per carton) and 10 tower speakers (arithmetic).
		await setLines([
			['SLV-PBL-20', 1440],
			['SLV-TWR-80', 10]
		]);
		const progress: unknown[] = [];
		const first = plan(await shipmentLoadPlan(coordinator, shipmentId, (p) => progress.push(p)));
		expect(first.cached).toBe(false);
		expect(first.info.map((i) => [i.sku, i.kind, i.count])).toEqual([
			['SLV-PBL-20', 'carton', 120],
			['SLV-TWR-80', 'carton', 10]
		]);
		expect(first.items[1]).toMatchObject({ orientations: 'thisWayUp', maxLoadOnTopKg: '40.000' });
		expect(first.containerTypes.map((c) => c.id)).toEqual(['C20GP', 'C40GP', 'C40HC']);
		// 130 cartons of about 3.5 m³ fit one 20 ft box (5.9 × 2.35 × 2.39 m ≈ 33 m³).
		expect(first.plan.containerCounts).toEqual([{ containerTypeId: 'C20GP', count: 1 }]);
		expect(first.plan.unplaced).toEqual([]);
		expect(
			validatePlan({ items: first.items, containers: first.containerTypes }, first.plan)
		).toEqual([]);
		expect(await countRows('shipment_load_plans', 'shipment_id = :id', { id: shipmentId })).toBe(1);

		const again = plan(await shipmentLoadPlan(coordinator, shipmentId));
		expect(again.cached).toBe(true);
		expect(again.plan).toEqual(first.plan);
	});

	it('is scoped like the shipment: its customer reads it, another customer gets a 404', async () => {
		expect(plan(await shipmentLoadPlan(hallvikBuyer, shipmentId)).cached).toBe(true);
		expect(await shipmentLoadPlan(wattlebirdBuyer, shipmentId)).toMatchObject({
			ok: false,
			status: 404
		});
	});

	it('computes afresh for a new revision and replaces the cached row', async () => {
		const before = plan(await shipmentLoadPlan(coordinator, shipmentId));
		await setLines([['SLV-PBL-20', 1440]]);
		const after = plan(await shipmentLoadPlan(coordinator, shipmentId));
		expect(after.cached).toBe(false);
		expect(after.version).toBeGreaterThan(before.version);
		expect(after.plan.containers[0]!.pieces).toBe(120);
		const rows = await ShipmentLoadPlan.findAll({ where: { shipmentId } });
		expect(rows.map((r) => r.shipmentVersion)).toEqual([after.version]);
	});

	it('computes afresh when the planner input changed under the same revision', async () => {
		// As when a container type is edited: the stored hash no longer matches the input.
		await ShipmentLoadPlan.update({ inputHash: '0'.repeat(64) }, { where: { shipmentId } });
		const outcome = plan(await shipmentLoadPlan(coordinator, shipmentId));
		expect(outcome.cached).toBe(false);
		const row = await ShipmentLoadPlan.findByPk(shipmentId, { rejectOnEmpty: true });
		expect(row.inputHash).not.toBe('0'.repeat(64));
	});

	it('lets two requests for the same revision share one computation', async () => {
		await setLines([['SLV-PBL-20', 1200]]);
		const [a, b] = await Promise.all([
			shipmentLoadPlan(coordinator, shipmentId),
			shipmentLoadPlan(coordinator, shipmentId)
		]);
		expect(plan(a).plan).toEqual(plan(b).plan);
		expect(plan(a).computedAt).toBe(plan(b).computedAt);
	});
});

describe('measure and planner input kept per stamp (kept-results.ts)', () => {
	it('are reused while nothing changes, and made afresh when the data or the shipment does', async () => {
		const measure = await keptShipmentMeasure(coordinator, shipmentId);
		const prepared = await prepareLoadPlan(coordinator, shipmentId);
		expect(await keptShipmentMeasure(coordinator, shipmentId)).toEqual(measure);
		expect((await keptShipmentMeasure(coordinator, shipmentId))?.measure).toBe(measure?.measure);
		expect(await prepareLoadPlan(coordinator, shipmentId)).toBe(prepared);
		// A write to a container type moves the data generation (migration 016), even one that
		// changes nothing: both are made afresh, with the same content.
		await sequelize.query(`UPDATE container_types SET name = name WHERE code = 'C20GP'`);
		const afterData = await prepareLoadPlan(coordinator, shipmentId);
		expect(afterData).not.toBe(prepared);
		expect(afterData).toEqual(prepared);
		const measureAfterData = await keptShipmentMeasure(coordinator, shipmentId);
		expect(measureAfterData?.measure).not.toBe(measure?.measure);
		expect(measureAfterData?.measure).toEqual(measure?.measure);
		// A new revision of the shipment: its lines are measured again.
		await setLines([['SLV-PBL-20', 240]]);
		const afterEdit = await keptShipmentMeasure(coordinator, shipmentId);
		expect(afterEdit?.measure.shipment.version).toBeGreaterThan(measure!.measure.shipment.version);
		expect(afterEdit?.measure.input.lines.map((l) => l.quantity)).toEqual([240]);
	});

	it('are handed only to those who may see the shipment', async () => {
		expect(await keptShipmentMeasure(coordinator, shipmentId)).not.toBeNull();
		expect(await keptShipmentMeasure(wattlebirdBuyer, shipmentId)).toBeNull();
		expect(await prepareLoadPlan(wattlebirdBuyer, shipmentId)).toMatchObject({ status: 404 });
	});
});
