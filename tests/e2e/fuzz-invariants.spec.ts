import { expect, test, type APIRequestContext } from '@playwright/test';
import Decimal from 'decimal.js';
import fc from 'fast-check';
import { calcLoadPlanBody } from '../../scripts/bench/load-plan-input';
import type { Placement } from '../../src/lib/load-plan/types';
import { DEMO, apiAs } from './helpers';
import { ONLY, RUNS, SEED } from './fuzz-settings';

// Valid but varied bodies for the stateless calc routes (issue 9): fast-check makes products,
// cartons, lines and loads a coordinator could send, and each answer is checked against figures
// this file works out itself with decimal.js from the definitions, not from Landfall's code:
// - cartons: full = ⌊quantity ÷ units per carton⌋, the rest in one part-filled carton (common
//   practice); net = quantity × net per unit; gross = net + cartons × tare, where the tare is the
//   full carton's gross less its contents; volume = cartons × L × W × H; totals are the sums;
// - air: each carton side to the nearest whole cm (0.5 up), 6000 cm³ = 1 kg, chargeable = the
//   greater of gross and volume weight rounded up to the next 0.5 kg (IATA, TACT Rules,
//   chargeable weight; from memory, as the measure module cites it);
// - sea groupage: 1 revenue tonne = 1 m³ or 1000 kg, whichever is more, at least 1 (common
//   practice, weight or measure);
// - load plan: every carton is placed once or listed as unplaced, inside the container, with no
//   two overlapping, and the payload and volume are the sums of what was placed.
// FUZZ_SEED / FUZZ_RUNS / FUZZ_ONLY as in fuzz.spec.ts.

const kg = (min: number, max: number) =>
	fc.integer({ min: min * 1000, max: max * 1000 }).map((g) => new Decimal(g).div(1000));

interface Product {
	sku: string;
	net: Decimal;
	units: number;
	l: number;
	w: number;
	h: number;
	tare: Decimal;
}

const product = (i: number): fc.Arbitrary<Product> =>
	fc.record({
		sku: fc.constant(`INV-${i}`),
		net: kg(0.001, 20),
		units: fc.integer({ min: 1, max: 48 }),
		l: fc.integer({ min: 40, max: 1200 }),
		w: fc.integer({ min: 40, max: 800 }),
		h: fc.integer({ min: 40, max: 800 }),
		tare: kg(0.05, 3)
	});

const measureCase = fc.integer({ min: 1, max: 3 }).chain((n) =>
	fc.tuple(
		fc.tuple(...Array.from({ length: n }, (_, i) => product(i))),
		fc.array(fc.tuple(fc.nat({ max: n - 1 }), fc.integer({ min: 1, max: 5000 })), {
			minLength: 1,
			maxLength: 4
		})
	)
);

/** Half up to a whole cm, from mm. */
const cm = (mm: number) => new Decimal(mm).div(10).toDecimalPlaces(0, Decimal.ROUND_HALF_UP);

const close = (reported: string, expected: Decimal, places: number, what: string) =>
	expect(
		new Decimal(reported).minus(expected).abs().lte(new Decimal(10).pow(-places)),
		`${what}: ${reported} vs ${expected}`
	).toBe(true);

let coordinator: APIRequestContext;

test.beforeAll(async ({ baseURL }) => {
	coordinator = await apiAs(baseURL!, DEMO.coordinator);
});

test.afterAll(async () => {
	await coordinator?.dispose();
});

test('measure: cartons, weights, volumes and chargeable weights agree with the definitions', async () => {
	test.skip(ONLY !== '' && !'measure invariants'.includes(ONLY), `FUZZ_ONLY=${ONLY}`);
	test.setTimeout(120_000);
	await fc.assert(
		fc.asyncProperty(measureCase, async ([products, picks]) => {
			const body = {
				products: products.map((p) => ({
					sku: p.sku,
					netKgPerUnit: p.net.toFixed(),
					packaging: {
						unitsPerCarton: p.units,
						lengthMm: p.l,
						widthMm: p.w,
						heightMm: p.h,
						cartonGrossKg: p.net.times(p.units).plus(p.tare).toFixed(),
						orientation: 'any',
						maxLoadOnTopKg: '100'
					}
				})),
				lines: picks.map(([i, quantity]) => ({ sku: products[i]!.sku, quantity }))
			};
			const response = await coordinator.post('/api/v1/calc/measure', { data: body });
			const text = await response.text();
			expect(response.status(), text.slice(0, 400)).toBe(200);
			const result = JSON.parse(text);
			let units = 0;
			let cartons = 0;
			let net = new Decimal(0);
			let gross = new Decimal(0);
			let volume = new Decimal(0);
			let cm3 = new Decimal(0);
			picks.forEach(([i, quantity], k) => {
				const p = products[i]!;
				const line = result.lines[k];
				const n = Math.ceil(quantity / p.units);
				expect(line.fullCartons).toBe(Math.floor(quantity / p.units));
				expect(line.remainderUnits).toBe(quantity % p.units);
				expect(line.cartons).toBe(n);
				expect(line.firstCarton).toBe(cartons + 1);
				expect(line.lastCarton).toBe(cartons + n);
				const lineNet = p.net.times(quantity);
				const lineGross = lineNet.plus(p.tare.times(n));
				const lineVolume = new Decimal(p.l).times(p.w).times(p.h).times(n).div(1e9);
				close(line.netKg, lineNet, 3, `line ${k} net`);
				close(line.grossKg, lineGross, 3, `line ${k} gross`);
				close(line.volumeM3, lineVolume, 6, `line ${k} volume`);
				units += quantity;
				cartons += n;
				net = net.plus(lineNet);
				gross = gross.plus(lineGross);
				volume = volume.plus(lineVolume);
				cm3 = cm3.plus(cm(p.l).times(cm(p.w)).times(cm(p.h)).times(n));
			});
			expect(result.totals.units).toBe(units);
			expect(result.totals.cartons).toBe(cartons);
			close(result.totals.netKg, net, 3, 'total net');
			close(result.totals.grossKg, gross, 3, 'total gross');
			close(result.totals.volumeM3, volume, 6, 'total volume');
			const air = result.chargeable.find((c: { mode: string }) => c.mode === 'air');
			const volumeWeight = cm3.div(6000);
			close(air.volumeWeightKg, volumeWeight, 3, 'air volume weight');
			const chargeable = Decimal.max(gross, volumeWeight).times(2).ceil().div(2);
			expect(new Decimal(air.chargeableKg).toFixed(3), 'air chargeable').toBe(
				chargeable.toFixed(3)
			);
			const lcl = result.chargeable.find((c: { mode: string }) => c.mode === 'sea_lcl');
			const tonnes = Decimal.max(1, volume, gross.div(1000));
			close(lcl.revenueTonnes, tonnes, 6, 'revenue tonnes');
		}),
		{ seed: SEED, numRuns: RUNS * 3, endOnFailure: true }
	);
});

/** A placed carton as the API answers it (the planner's own type, read here as plain JSON). */
type Box = Placement;

const overlap = (a: Box, b: Box) =>
	a.x < b.x + b.lengthMm &&
	b.x < a.x + a.lengthMm &&
	a.y < b.y + b.widthMm &&
	b.y < a.y + a.widthMm &&
	a.z < b.z + b.heightMm &&
	b.z < a.z + a.heightMm;

const loadCase = fc.tuple(
	fc.array(
		fc.record({
			lengthMm: fc.integer({ min: 200, max: 1200 }),
			widthMm: fc.integer({ min: 200, max: 1000 }),
			heightMm: fc.integer({ min: 150, max: 900 }),
			grams: fc.integer({ min: 500, max: 60_000 }),
			count: fc.integer({ min: 1, max: 25 }),
			orientations: fc.constantFrom('any', 'thisWayUp')
		}),
		{ minLength: 1, maxLength: 3 }
	),
	// The 20 ft and 40 ft general-purpose containers of Landfall's reference list (ISO 668 sizes).
	fc.constantFrom(...calcLoadPlanBody().containers)
);

test('load plan: every carton placed once or unplaced, inside, apart, and summed right', async () => {
	test.skip(ONLY !== '' && !'load plan invariants'.includes(ONLY), `FUZZ_ONLY=${ONLY}`);
	test.setTimeout(180_000);
	await fc.assert(
		fc.asyncProperty(loadCase, async ([items, container]) => {
			const body = {
				items: items.map((it, i) => ({
					id: `I${i}`,
					label: `Carton type ${i + 1}`,
					lengthMm: it.lengthMm,
					widthMm: it.widthMm,
					heightMm: it.heightMm,
					weightKg: new Decimal(it.grams).div(1000).toFixed(),
					count: it.count,
					orientations: it.orientations
				})),
				containers: [container],
				options: { timeBudgetMs: 20, seed: 1 }
			};
			const response = await coordinator.post('/api/v1/calc/load-plan', { data: body });
			const text = await response.text();
			expect(response.status(), text.slice(0, 400)).toBe(200);
			const plan = JSON.parse(text);
			const placed = new Map<string, number>();
			for (const c of plan.containers) {
				const boxes: Box[] = c.placements;
				let grams = 0;
				let mm3 = new Decimal(0);
				// Plain checks collected, one expect at the end: thousands of expect calls per case
				// would take longer than the planning.
				const wrong: string[] = [];
				boxes.forEach((b, k) => {
					if (b.x < 0 || b.y < 0 || b.z < 0) wrong.push(`box ${k} before the origin`);
					if (
						b.x + b.lengthMm > container.lengthMm ||
						b.y + b.widthMm > container.widthMm ||
						b.z + b.heightMm > container.heightMm
					)
						wrong.push(`box ${k} outside the container`);
					const item = items[Number(b.itemTypeId.slice(1))]!;
					const sides = [b.lengthMm, b.widthMm, b.heightMm].sort((p, q) => p - q).join('×');
					const own = [item.lengthMm, item.widthMm, item.heightMm].sort((p, q) => p - q).join('×');
					if (sides !== own) wrong.push(`box ${k} is ${sides}, its item ${own}`);
					if (item.orientations === 'thisWayUp' && b.heightMm !== item.heightMm)
						wrong.push(`box ${k} of a this-way-up item lies on its side`);
					placed.set(b.itemTypeId, (placed.get(b.itemTypeId) ?? 0) + 1);
					grams += item.grams;
					mm3 = mm3.plus(new Decimal(b.lengthMm).times(b.widthMm).times(b.heightMm));
					for (let j = 0; j < k; j++)
						if (overlap(boxes[j]!, b)) wrong.push(`boxes ${j} and ${k} overlap`);
				});
				expect(wrong).toEqual([]);
				expect(c.pieces).toBe(boxes.length);
				close(c.payloadKg, new Decimal(grams).div(1000), 3, 'payload');
				expect(new Decimal(c.payloadKg).lte(container.maxPayloadKg), 'within payload').toBe(true);
				close(c.loadedVolumeM3, mm3.div(1e9), 6, 'loaded volume');
			}
			for (const u of plan.unplaced as { itemTypeId: string; count: number }[])
				placed.set(u.itemTypeId, (placed.get(u.itemTypeId) ?? 0) + u.count);
			items.forEach((it, i) => expect(placed.get(`I${i}`) ?? 0, `item I${i}`).toBe(it.count));
		}),
		{ seed: SEED, numRuns: RUNS * 2, endOnFailure: true }
	);
});
