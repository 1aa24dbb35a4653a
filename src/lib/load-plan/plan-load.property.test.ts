import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { planLoad } from './plan-load';
import type { LoadContainerType, LoadItemType, LoadPlanInput, OrientationRule } from './types';
import { validatePlan } from './validate-plan';

const rule: fc.Arbitrary<OrientationRule> = fc.oneof(
	fc.constant('any' as const),
	fc.constant('thisWayUp' as const),
	fc
		.tuple(fc.boolean(), fc.boolean(), fc.boolean())
		.filter((f) => f.some(Boolean))
		.map(([lengthUp, widthUp, heightUp]) => ({ lengthUp, widthUp, heightUp }))
);

const kg = (max: number) => fc.integer({ min: 0, max: max * 10 }).map((n) => (n / 10).toString());

const item = (i: number): fc.Arbitrary<LoadItemType> =>
	fc.record({
		id: fc.constant(`i${i}`),
		label: fc.constant(`Item ${i}`),
		lengthMm: fc.integer({ min: 40, max: 320 }),
		widthMm: fc.integer({ min: 40, max: 320 }),
		heightMm: fc.integer({ min: 40, max: 320 }),
		weightKg: kg(40),
		count: fc.integer({ min: 1, max: 14 }),
		orientations: rule,
		stackable: fc.boolean(),
		maxLoadOnTopKg: fc.option(kg(60), { nil: undefined })
	});

const container = (i: number): fc.Arbitrary<LoadContainerType> =>
	fc
		.record({
			lengthMm: fc.integer({ min: 300, max: 900 }),
			widthMm: fc.integer({ min: 200, max: 500 }),
			heightMm: fc.integer({ min: 200, max: 500 }),
			doorCut: fc.integer({ min: 0, max: 120 }),
			maxPayloadKg: fc.integer({ min: 20, max: 600 }).map(String)
		})
		.map(({ doorCut, ...c }) => ({
			id: `c${i}`,
			...c,
			doorWidthMm: c.widthMm - doorCut,
			doorHeightMm: c.heightMm - doorCut
		}));

const instance: fc.Arbitrary<LoadPlanInput> = fc
	.record({
		n: fc.integer({ min: 1, max: 4 }),
		m: fc.integer({ min: 1, max: 2 }),
		supportShare: fc.constantFrom(1, 0.75),
		maxContainers: fc.integer({ min: 1, max: 3 })
	})
	.chain(({ n, m, supportShare, maxContainers }) =>
		fc.record({
			items: fc.tuple(...Array.from({ length: n }, (_, i) => item(i))),
			containers: fc.tuple(...Array.from({ length: m }, (_, i) => container(i))),
			options: fc.constant({ supportShare, maxContainers, timeBudgetMs: 40 })
		})
	);

describe('planLoad on random instances', () => {
	it('keeps every rule validatePlan checks, and accounts for every piece once', () => {
		fc.assert(
			fc.property(instance, (inp) => {
				const r = planLoad(inp);
				expect(r.ok).toBe(true);
				if (!r.ok) return;
				// Overlap, bounds, door, orientation, support share, stacking, payload, counts.
				expect(validatePlan(inp, r.plan)).toEqual([]);
				for (const it of inp.items) {
					const placed = r.plan.containers
						.flatMap((c) => c.placements)
						.filter((p) => p.itemTypeId === it.id).length;
					const told = r.plan.unplaced.filter((u) => u.itemTypeId === it.id);
					expect(told.length).toBeLessThanOrEqual(1);
					expect(placed + (told[0]?.count ?? 0)).toBe(it.count);
				}
				expect(r.plan.containers.length).toBeLessThanOrEqual(inp.options!.maxContainers!);
			}),
			{ numRuns: 40, seed: 20260 }
		);
	});
});
