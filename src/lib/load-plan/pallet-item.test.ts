import { describe, expect, it } from 'vitest';
import { palletItem } from './pallet-item';
import { planLoad } from './plan-load';
import { GP20, input } from './test-fixtures';
import { validatePlan } from './validate-plan';

describe('palletItem', () => {
	const euro = palletItem({
		id: 'eur',
		label: 'EUR pallet, TVs',
		lengthMm: 1200,
		widthMm: 800,
		loadedHeightMm: 1500,
		grossKg: '650',
		count: 11
	});

	it('stands this way up and is not stackable unless a load on top is given', () => {
		expect(euro.orientations).toBe('thisWayUp');
		expect(euro.stackable).toBe(false);
		const stackable = palletItem({
			...euro,
			loadedHeightMm: 1100,
			grossKg: '400',
			maxLoadOnTopKg: '500'
		});
		expect(stackable.stackable).toBe(true);
	});

	it('loads 11 EUR pallets (1200 × 800) into a 20 ft box in one tier, nothing on top', () => {
		// 11 EUR pallets per 20 ft container, single tier: common practice figure.
		const inp = input([euro], [GP20], { timeBudgetMs: 1500 });
		const r = planLoad(inp);
		expect(r.ok).toBe(true);
		if (!r.ok) return;
		expect(r.plan.unplaced).toEqual([]);
		const ps = r.plan.containers[0]!.placements;
		expect(ps).toHaveLength(11);
		expect(ps.every((p) => p.z === 0 && p.heightMm === 1500)).toBe(true);
		expect(validatePlan(inp, r.plan)).toEqual([]);
	});
});
