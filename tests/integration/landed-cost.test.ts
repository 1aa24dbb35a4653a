// Landed cost of the seeded demo shipments against the real database: the data the services pick,
// what is reported missing, and saved scenarios that keep their figures when the data changes.
// Demo rates are invented (seeders/demo-landed-cost.ts); the checks are about consistency.
import Decimal from 'decimal.js';
import { QueryTypes } from 'sequelize';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { landedCost, type LandedCostOk } from '$lib/landed-cost';
import type { SessionUser } from '$lib/server/auth/session-user';
import { Shipment } from '$lib/server/db/models';
import { shipmentLandedCost } from '$lib/server/services/landed-cost/compute';
import { getScenario, saveScenario } from '$lib/server/services/landed-cost/scenarios';
import { sequelize, sessionUserFor } from './db';

let finance: SessionUser;
let broker: SessionUser;
let hallvik = '';
const scenarios: string[] = [];

beforeAll(async () => {
	[finance, broker] = await Promise.all([
		sessionUserFor('finance@solvrae.example'),
		sessionUserFor('broker@kaaiman.example')
	]);
	const ship = (await Shipment.findAll()).find(
		(s) => s.notes === 'Demo scenario: hallvik-speakers'
	);
	if (!ship) throw new Error('No seeded Hallvik shipment: is the database seeded?');
	hallvik = ship.id;
});

afterAll(async () => {
	if (scenarios.length)
		await sequelize.query('DELETE FROM landed_cost_scenarios WHERE id IN (:ids)', {
			replacements: { ids: scenarios }
		});
});

const ok = (r: Awaited<ReturnType<typeof shipmentLandedCost>>): LandedCostOk => {
	if (!r.ok || !r.result.ok) throw new Error(JSON.stringify(r.ok ? r.result : r));
	return r.result;
};

describe('shipment landed cost', () => {
	it('sums its components to the total, and the lines to every component', async () => {
		const r = ok(await shipmentLandedCost(finance, hallvik, 'sea_lcl', { date: '2026-12-02' }));
		const sum = Object.values(r.components).reduce((a, c) => a.plus(c.amount), new Decimal(0));
		expect(sum.toFixed(2)).toBe(r.total.amount);
		for (const key of Object.keys(r.components) as (keyof typeof r.components)[]) {
			const lines = r.perLine.reduce((a, l) => a.plus(l.shares[key]), new Decimal(0));
			expect(lines.toFixed(2), key).toBe(r.components[key].amount);
		}
		// Germany: CIF basis and 19 % import VAT (seeded from the Union Customs Code and UStG).
		expect(r.customsCurrency).toBe('EUR');
		expect(r.asOf.data.map((d) => d.kind)).toEqual(
			expect.arrayContaining(['rate_card', 'tariff', 'country', 'exchange_rate'])
		);
	});

	it('names the missing exchange rate instead of computing with a zero', async () => {
		const r = await shipmentLandedCost(finance, hallvik, 'sea_lcl', { date: '2027-03-01' });
		if (!r.ok) throw new Error(r.message);
		expect(r.result.ok).toBe(false);
		if (r.result.ok) return;
		expect(r.result.missing.map((m) => m.message).join(' ')).toMatch(/exchange rate|expired/i);
	});

	it('names the lane that has no rate card', async () => {
		const r = await shipmentLandedCost(finance, hallvik, 'road', { date: '2026-12-02' });
		if (!r.ok) throw new Error(r.message);
		expect(r.result.ok).toBe(false);
		if (!r.result.ok) expect(r.result.missing.map((m) => m.path)).toContain('rateCard');
	});
});

describe('kept results', () => {
	const ask = () => shipmentLandedCost(finance, hallvik, 'sea_lcl', { date: '2026-12-02' });

	it('are reused while nothing they depend on changes, and dropped when something does', async () => {
		const first = await ask();
		expect(await ask()).toBe(first);
		// Any write to reference data moves the generation (migration 016), even one that changes
		// no figure; the next answer is computed afresh, with the same figures.
		await sequelize.query(
			`UPDATE country_rules SET source = source WHERE id = (SELECT id FROM country_rules LIMIT 1)`
		);
		const afterData = await ask();
		expect(afterData).not.toBe(first);
		expect(afterData).toEqual(first);
		// An edit of the shipment moves its version.
		await sequelize.query('UPDATE shipments SET version = version + 1 WHERE id = :id', {
			replacements: { id: hallvik }
		});
		const afterEdit = await ask();
		expect(afterEdit).not.toBe(afterData);
		expect(afterEdit).toEqual(afterData);
	});

	it('are kept per set of assumptions', async () => {
		const byWeight = await shipmentLandedCost(finance, hallvik, 'sea_lcl', {
			date: '2026-12-02',
			allocation: 'weight'
		});
		const byValue = await shipmentLandedCost(finance, hallvik, 'sea_lcl', {
			date: '2026-12-02',
			allocation: 'value'
		});
		if (!byWeight.ok || !byValue.ok) throw new Error('not computed');
		expect(byWeight.input.allocation).toBe('weight');
		expect(byValue.input.allocation).toBe('value');
	});

	it('are never handed to someone outside staff', async () => {
		await ask();
		const denied = await shipmentLandedCost(broker, hallvik, 'sea_lcl', { date: '2026-12-02' });
		expect(denied.ok ? 200 : denied.status).toBe(404);
	});
});

describe('saved scenarios', () => {
	it('keep their figures when a tariff changes, and recompute the same from their own input', async () => {
		const options = { date: '2026-12-02', allocation: 'value' as const };
		const saved = await saveScenario(
			finance,
			hallvik,
			{ name: 'Groupage, integration test', modes: ['sea_lcl', 'road'], options },
			null
		);
		if (!saved.ok) throw new Error(saved.message);
		scenarios.push(saved.value.id);
		expect(saved.value.modes).toEqual(['sea_lcl']);
		expect(saved.value.skipped).toEqual(['road']);
		const before = ok(await shipmentLandedCost(finance, hallvik, 'sea_lcl', options));

		const [row] = await sequelize.query<{ id: string; duty: unknown }>(
			"SELECT id, duty FROM tariff_rows WHERE destination_country = 'DE' AND hs_prefix = '851822'",
			{ type: QueryTypes.SELECT }
		);
		await sequelize.query(
			`UPDATE tariff_rows SET duty = '{"kind":"ad_valorem","ratePercent":"9"}' WHERE id = :id`,
			{ replacements: { id: row!.id } }
		);
		try {
			const after = ok(await shipmentLandedCost(finance, hallvik, 'sea_lcl', options));
			expect(new Decimal(after.total.amount).gt(before.total.amount)).toBe(true);
			const scenario = (await getScenario(finance, hallvik, saved.value.id))!;
			expect(scenario.results.sea_lcl!.total).toEqual(before.total);
			expect(landedCost(scenario.inputs.sea_lcl!)).toEqual(scenario.results.sea_lcl);
		} finally {
			await sequelize.query('UPDATE tariff_rows SET duty = :duty::jsonb WHERE id = :id', {
				replacements: { id: row!.id, duty: JSON.stringify(row!.duty) }
			});
		}
	});

	it('are for staff only', async () => {
		const denied = await saveScenario(
			broker,
			hallvik,
			{ name: 'x', modes: ['sea_lcl'], options: {} },
			null
		);
		expect(denied.ok ? 200 : denied.status).toBe(403);
	});
});
