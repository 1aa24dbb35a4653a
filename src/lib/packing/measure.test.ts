import Decimal from 'decimal.js';
import fc from 'fast-check';
import { describe, expect, expectTypeOf, it } from 'vitest';
import type { z } from 'zod';
import type { ChargeMode, ChargeableWeight } from './chargeable';
import { measure, type MeasureResult } from './measure';
import {
	isValidatedMeasureInput,
	measureInputSchema,
	measureResultSchema,
	type MeasureInput,
	type PackagingInput
} from './schema';

const router: PackagingInput = {
	unitsPerCarton: 24,
	lengthMm: 400,
	widthMm: 300,
	heightMm: 250,
	cartonGrossKg: '13.2',
	orientation: 'this_way_up',
	maxLoadOnTopKg: '120'
};
const cable: PackagingInput = {
	unitsPerCarton: 10,
	lengthMm: 600,
	widthMm: 400,
	heightMm: 300,
	cartonGrossKg: '11',
	orientation: 'any',
	maxLoadOnTopKg: '200'
};
const eur = {
	lengthMm: 1200,
	widthMm: 800,
	deckHeightMm: 144,
	tareKg: '25',
	maxGrossKg: '1525',
	maxLoadedHeightMm: 1800
};

const shipment = (withPallet: boolean): MeasureInput => ({
	products: [
		{ sku: 'RTR', netKgPerUnit: '0.5', packaging: router },
		{ sku: 'CBL', netKgPerUnit: '1', packaging: cable }
	],
	lines: [
		{ sku: 'RTR', quantity: 960 },
		{ sku: 'CBL', quantity: 145 }
	],
	...(withPallet ? { pallet: eur } : {})
});

type Measured = Extract<MeasureResult, { ok: true }>;

function ok(result: MeasureResult): Measured {
	if (!result.ok) throw new Error(JSON.stringify(result.problems));
	return result;
}

function mode(result: Measured, wanted: ChargeMode): ChargeableWeight {
	const found = result.chargeable.find((c) => c.mode === wanted);
	if (found === undefined) throw new Error(`no ${wanted}`);
	return found;
}

describe('measure: loose cartons', () => {
	it('packs each line, numbers cartons across lines and totals them', () => {
		// Line 1: 960 ÷ 24 = 40 cartons (1–40), 40 × 13.2 = 528 kg, net 480 kg, 40 × 0.03 = 1.2 m³.
		// Line 2: 145 ÷ 10 = 14 full + 1 of 5 (41–55); tare 11 − 10 = 1 kg, last carton 1 + 5 = 6 kg;
		// gross 14 × 11 + 6 = 160 kg, net 145 kg, 15 × 0.072 = 1.08 m³.
		const r = ok(measure(shipment(false)));
		expect(r.lines.map((l) => [l.lineIndex, l.sku, l.firstCarton, l.lastCarton])).toEqual([
			[0, 'RTR', 1, 40],
			[1, 'CBL', 41, 55]
		]);
		expect(
			r.lines[1]?.groups.map((g) => [
				g.fromCarton,
				g.toCarton,
				g.unitsPerCarton,
				g.grossKgPerCarton
			])
		).toEqual([
			[41, 54, 10, '11.000'],
			[55, 55, 5, '6.000']
		]);
		expect(r.totals).toEqual({
			units: 1105,
			cartons: 55,
			netKg: '625.000',
			grossKg: '688.000',
			volumeM3: '2.280000'
		});
		expect(r.pallets).toBeNull();
		expect(r.problems).toEqual([]);
	});

	it('computes chargeable weight from the cartons', () => {
		// Air: 40 × (40 × 30 × 25 cm = 30,000 cm³) + 15 × (60 × 40 × 30 = 72,000) = 1,200,000 +
		// 1,080,000 = 2,280,000 cm³ ÷ 6000 = 380 kg, below the 688 kg gross: 688 kg.
		// Road: 2.28 m³ × 333 = 759.24 kg > 688 kg → 759.24 kg. LCL: 2.28 m³ > 0.688 t → 2.28.
		const r = ok(measure(shipment(false)));
		expect(mode(r, 'air')).toMatchObject({
			basis: 'gross',
			volumeWeightKg: '380.000',
			chargeableKg: '688.000'
		});
		expect(mode(r, 'road')).toMatchObject({ basis: 'volume', chargeableKg: '759.240' });
		expect(mode(r, 'sea_lcl').revenueTonnes).toBe('2.280000');
		expect(mode(r, 'sea_fcl').chargeableKg).toBeNull();
		expect(mode(r, 'air').steps[0]).toMatch(/^Line 1, cartons 1–40 \(40 pieces\)/);
		expect(mode(r, 'air').steps[2]).toMatch(/^Line 2, carton 55 \(part-filled\)/);
	});

	it('serialises to JSON as it is and matches the result schema', () => {
		for (const withPallet of [false, true]) {
			const r = measure(shipment(withPallet));
			expect(JSON.parse(JSON.stringify(r))).toEqual(r);
			expect(measureResultSchema.parse(r)).toEqual(r);
		}
	});

	it('has the type the result schema describes', () => {
		expectTypeOf<z.infer<typeof measureResultSchema>>().toEqualTypeOf<MeasureResult>();
	});
});

describe('measure: palletised', () => {
	it('palletises each line and charges on the pallets', () => {
		// Line 1: 48 per pallet (see pallets.test.ts) → 40 cartons on 1 pallet: 5 layers, 144 + 5 ×
		// 250 = 1394 mm, 25 + 40 × 13.2 = 553 kg.
		// Line 2: 600 × 400 × 300, any face. Upright 4 per layer × floor(1656 ÷ 300) = 5 layers = 20
		// (stacking 200 ÷ 11 → 18 on top, no limit here). 600 vertical: footprint 400 × 300, 8 per
		// layer × floor(1656 ÷ 600) = 2 layers = 16. 400 vertical: footprint 600 × 300, 4 per layer
		// (2 × 2; the area bound floor(960,000 ÷ 180,000) = 5 is out of reach) × 4 layers = 16.
		// Upright wins with 20.
		// 15 cartons on 1 pallet: 4 layers, 144 + 4 × 300 = 1344 mm, 25 + 14 × 11 + 6 = 185 kg.
		const r = ok(measure(shipment(true)));
		const pallets = r.pallets;
		if (pallets === null) throw new Error('not palletised');
		expect(pallets.lines.map((l) => [l.sku, l.plan.firstPallet, l.plan.lastPallet])).toEqual([
			['RTR', 1, 1],
			['CBL', 2, 2]
		]);
		expect(pallets.lines[1]?.plan.stowage.tried).toEqual([
			{ verticalSide: 'height', perLayer: 4, cartonsPerPallet: 20 },
			{ verticalSide: 'length', perLayer: 8, cartonsPerPallet: 16 },
			{ verticalSide: 'width', perLayer: 4, cartonsPerPallet: 16 }
		]);
		expect(pallets.lines[1]?.plan.stowage.verticalSide).toBe('height');
		expect(
			pallets.lines.map((l) =>
				l.plan.groups.map((g) => [g.cartonsPerPallet, g.loadedHeightMm, g.grossKgPerPallet])
			)
		).toEqual([[[40, 1394, '553.000']], [[15, 1344, '185.000']]]);
		// 688 kg of cartons + 2 × 25 kg of pallets = 738 kg.
		expect(pallets).toMatchObject({ pallets: 2, tareKg: '50.000', grossKg: '738.000' });
		// 1.2 × 0.8 × (1.394 + 1.344) = 2.62848 m³.
		expect(pallets.volumeM3).toBe('2.628480');
		// Air on pallets: 120 × 80 × 139 cm (139.4 → 139) = 1,334,400 cm³ and 120 × 80 × 134 cm
		// (134.4 → 134) = 1,286,400 cm³: 2,620,800 ÷ 6000 = 436.8 kg < 738 kg → 738 kg.
		expect(mode(r, 'air')).toMatchObject({
			basis: 'gross',
			volumeWeightKg: '436.800',
			chargeableKg: '738.000'
		});
		expect(mode(r, 'sea_lcl').revenueTonnes).toBe('2.628480');
		// The carton totals stay the cartons'.
		expect(r.totals.grossKg).toBe('688.000');
	});

	it('reports cartons that cannot go on the pallet under "pallet"', () => {
		const input = shipment(true);
		input.products[1] = {
			sku: 'CBL',
			netKgPerUnit: '1',
			packaging: { ...cable, lengthMm: 1300, widthMm: 900, heightMm: 900 }
		};
		const r = measure(input);
		expect(r.ok).toBe(false);
		expect(r.problems).toEqual([
			{
				path: 'pallet',
				message:
					'Line 2 (SKU “CBL”): A 1300 × 900 × 900 mm carton does not fit within the 1200 × 800 mm pallet on any face (no overhang).'
			}
		]);
	});
});

describe('measure: problems', () => {
	it('returns field-path problems instead of throwing', () => {
		const input = shipment(false);
		input.lines = [
			{ sku: 'RTR', quantity: 0 },
			{ sku: 'NOPE', quantity: 3 }
		];
		const r = measure(input);
		expect(r).toEqual({
			ok: false,
			problems: [
				{ path: 'lines.0.quantity', message: 'Enter a whole number from 1 to 1000000000.' },
				{ path: 'lines.1.sku', message: 'No product with SKU “NOPE” in products.' }
			]
		});
	});

	it('validates even when the caller skipped the schema', () => {
		const r = measure({ products: [], lines: [{ sku: 'X', quantity: -1 }] } as MeasureInput);
		expect(r.problems.map((p) => p.path)).toEqual(['lines.0.quantity', 'lines.0.sku']);
	});
});

// ——— properties ———

const packagingArb: fc.Arbitrary<PackagingInput> = fc.record({
	unitsPerCarton: fc.integer({ min: 1, max: 60 }),
	lengthMm: fc.integer({ min: 150, max: 800 }),
	widthMm: fc.integer({ min: 100, max: 700 }),
	heightMm: fc.integer({ min: 100, max: 700 }),
	cartonGrossKg: fc.constant('0'),
	orientation: fc.constantFrom('any' as const, 'this_way_up' as const),
	maxLoadOnTopKg: fc.option(fc.integer({ min: 0, max: 400 }).map(String), { nil: null })
});

const productArb = fc
	.tuple(fc.integer({ min: 1, max: 3000 }), packagingArb, fc.integer({ min: 0, max: 2000 }))
	.map(([grams, packaging, tareGrams]) => {
		const net = new Decimal(grams).div(1000);
		return {
			netKgPerUnit: net.toFixed(),
			packaging: {
				...packaging,
				cartonGrossKg: net
					.times(packaging.unitsPerCarton)
					.plus(new Decimal(tareGrams + 1).div(1000))
					.toFixed()
			}
		};
	});

const shipmentArb = fc
	.tuple(
		fc.array(productArb, { minLength: 1, maxLength: 3 }),
		fc.array(fc.tuple(fc.nat(), fc.integer({ min: 1, max: 3000 })), { minLength: 1, maxLength: 4 }),
		fc.boolean()
	)
	.map(([products, lines, withPallet]): MeasureInput => ({
		products: products.map((p, i) => ({ sku: `P${i}`, ...p })),
		lines: lines.map(([pick, quantity]) => ({ sku: `P${pick % products.length}`, quantity })),
		...(withPallet ? { pallet: eur } : {})
	}));

function chargeableFigure(r: ChargeableWeight): Decimal {
	return new Decimal(r.chargeableKg ?? r.revenueTonnes ?? r.grossKg);
}

describe('properties', () => {
	it('conserves units and cartons: units in = units packed, cartons on pallets = cartons', () => {
		fc.assert(
			fc.property(shipmentArb, (input) => {
				const r = measure(input);
				if (!r.ok) {
					// Only a carton that cannot go on the pallet may stop a valid shipment.
					expect(r.problems.every((p) => p.path === 'pallet')).toBe(true);
					return;
				}
				expect(r.totals.units).toBe(input.lines.reduce((s, l) => s + l.quantity, 0));
				r.lines.forEach((line, i) => {
					const packed = line.groups.reduce((s, g) => s + g.cartons * g.unitsPerCarton, 0);
					expect(packed).toBe(input.lines[i]?.quantity);
				});
				expect(r.lines.reduce((s, l) => s + l.cartons, 0)).toBe(r.totals.cartons);
				if (r.pallets !== null) {
					const onPallets = r.pallets.lines.reduce(
						(s, l) => s + l.plan.groups.reduce((t, g) => t + g.pallets * g.cartonsPerPallet, 0),
						0
					);
					expect(onPallets).toBe(r.totals.cartons);
					const tares = new Decimal(eur.tareKg).times(r.pallets.pallets);
					expect(
						new Decimal(r.pallets.grossKg).minus(tares).minus(r.totals.grossKg).abs().lte('0.001')
					).toBe(true);
				}
				for (const c of r.chargeable) {
					if (c.chargeableKg !== null)
						expect(new Decimal(c.chargeableKg).gte(c.grossKg)).toBe(true);
				}
			}),
			{ numRuns: 150 }
		);
	});

	it('more units never give fewer cartons, pallets or chargeable weight', () => {
		fc.assert(
			fc.property(shipmentArb, fc.nat(), fc.integer({ min: 1, max: 500 }), (input, which, more) => {
				const bigger = structuredClone(input);
				const line = bigger.lines[which % bigger.lines.length];
				if (line === undefined) throw new Error('no line');
				line.quantity += more;
				const a = measure(input);
				const b = measure(bigger);
				expect(b.ok).toBe(a.ok);
				if (!a.ok || !b.ok) return;
				expect(b.totals.cartons).toBeGreaterThanOrEqual(a.totals.cartons);
				expect(new Decimal(b.totals.grossKg).gte(a.totals.grossKg)).toBe(true);
				expect(b.pallets?.pallets ?? 0).toBeGreaterThanOrEqual(a.pallets?.pallets ?? 0);
				a.chargeable.forEach((ca, i) => {
					const cb = b.chargeable[i];
					if (cb === undefined) throw new Error('missing mode');
					expect(chargeableFigure(cb).gte(chargeableFigure(ca)), ca.mode).toBe(true);
				});
			}),
			{ numRuns: 150 }
		);
	});
});

// measure() trusts measureInputSchema's own output without validating it again: that output must
// be frozen (so it is still what the schema accepted) and measure like a plain copy.
describe('measure of measureInputSchema output', () => {
	it('is marked and deeply frozen, and measures like a plain copy', () => {
		const parsed = measureInputSchema.parse(shipment(true));
		expect(isValidatedMeasureInput(parsed)).toBe(true);
		expect(Object.isFrozen(parsed.lines[0])).toBe(true);
		expect(Object.isFrozen(parsed.products[0]?.packaging)).toBe(true);
		expect(Object.isFrozen(parsed.pallet)).toBe(true);
		expect(() => {
			(parsed.lines[0] as { quantity: number }).quantity = 0;
		}).toThrow(TypeError);
		const copy = structuredClone(parsed);
		expect(isValidatedMeasureInput(copy)).toBe(false);
		expect(measure(parsed)).toEqual(measure(copy));
	});

	it('leaves the caller’s own object alone and still checks anything else', () => {
		const own = shipment(false);
		measureInputSchema.parse(own);
		expect(isValidatedMeasureInput(own)).toBe(false);
		expect(Object.isFrozen(own)).toBe(false);
		const result = measure({ ...own, lines: [{ sku: 'NONE', quantity: 1 }] });
		expect(result.ok).toBe(false);
		expect(result.problems[0]?.path).toBe('lines.0.sku');
	});
});

describe('measure past 2^53 milligrams', () => {
	it('keeps totals exact when whole numbers outgrow JS numbers (decimal.js takes over)', () => {
		// 10^9 units of 20.000001 kg: 2 × 10^16 mg and more, beyond 2^53 ≈ 9.007 × 10^15.
		const result = ok(
			measure({
				products: [
					{
						sku: 'HEAVY',
						netKgPerUnit: '20.000001',
						packaging: { ...router, unitsPerCarton: 1, cartonGrossKg: '21.000001' }
					}
				],
				lines: [{ sku: 'HEAVY', quantity: 1_000_000_000 }]
			})
		);
		// Exact by hand: 20.000001 × 10^9 = 20 000 001 000; 21.000001 × 10^9 = 21 000 001 000;
		// 0.4 × 0.3 × 0.25 m = 0.03 m³ per carton, × 10^9.
		expect(result.totals).toEqual({
			units: 1_000_000_000,
			cartons: 1_000_000_000,
			netKg: '20000001000.000',
			grossKg: '21000001000.000',
			volumeM3: '30000000.000000'
		});
		expect(result.lines[0]?.netKg).toBe('20000001000.000');
	});
});
