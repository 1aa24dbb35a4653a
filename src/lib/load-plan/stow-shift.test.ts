import { describe, expect, it } from 'vitest';
import { planLoad } from './plan-load';
import { balancingShift } from './stow-shift';
import { GP20, carton, input } from './test-fixtures';
import type { LoadPlan, LoadPlanInput } from './types';
import { validatePlan } from './validate-plan';

function plan(inp: LoadPlanInput): LoadPlan {
	const r = planLoad(inp);
	if (!r.ok) throw new Error(JSON.stringify(r.problems));
	expect(validatePlan(inp, r.plan)).toEqual([]);
	return r.plan;
}

// 24 cartons of 1000 × 1176 × 598 (this way up): 2 across, 4 high, 3 deep = 3000 mm of the
// 20 ft box's 5898 mm inside length (a part load).
const part = () => ({
	...carton('p', 1000, 1176, 598, 24),
	orientations: 'thisWayUp' as const
});

describe('balancing a part load', () => {
	it('clamps the shift to the free length on either side', () => {
		expect(balancingShift(1500, 5898, { lo: 0, hi: 3000 })).toBe(1449);
		expect(balancingShift(500, 5898, { lo: 0, hi: 1000 })).toBe(2449);
		expect(balancingShift(1000, 5898, { lo: 0, hi: 5000 })).toBe(898);
		expect(balancingShift(4000, 5898, { lo: 0, hi: 5000 })).toBe(0);
	});

	it('moves the stow towards the door so the centre of gravity is in the middle', () => {
		const p = plan(input([part()], [GP20]));
		const c = p.containers[0]!;
		expect(c.pieces).toBe(24);
		const xs = c.placements.map((q) => q.x);
		expect(Math.min(...xs)).toBeGreaterThan(0);
		// The CTU Code's general limit is 5 % of the length (annex 7, 3.1.4): now well within.
		expect(Math.abs(c.centreOfGravity!.longitudinalOffsetMm)).toBeLessThanOrEqual(1);
		expect(c.shift!.xMm).toBe(Math.min(...xs));
		expect(c.warnings).toHaveLength(1);
		expect(c.warnings[0]).toContain('brace');
		expect(c.warnings[0]).toContain(`${c.shift!.xMm} mm from the front wall`);
	});

	it("keeps the stow at the front wall with stowAt 'frontWall' (and warns of the offset)", () => {
		const p = plan(input([part()], [GP20], { stowAt: 'frontWall' }));
		const c = p.containers[0]!;
		expect(Math.min(...c.placements.map((q) => q.x))).toBe(0);
		expect(c.shift).toEqual({ xMm: 0, yMm: 0 });
		expect(c.warnings[0]).toContain('towards the front wall');
	});

	it('refuses an unknown stowAt', () => {
		const r = planLoad(input([part()], [GP20], { stowAt: 'middle' as 'balanced' }));
		expect(r.ok).toBe(false);
		expect(r.problems.map((q) => q.path)).toEqual(['options.stowAt']);
	});
});
