import { afterEach, describe, expect, it, vi } from 'vitest';
import { planLoad } from './plan-load';
import { box, carton, input } from './test-fixtures';
import type { LoadPlan, LoadPlanInput } from './types';
import { validatePlan } from './validate-plan';
import { WORK_PER_MS } from './work-budget';

function plan(inp: LoadPlanInput): LoadPlan {
	const r = planLoad(inp);
	if (!r.ok) throw new Error(JSON.stringify(r.problems));
	expect(validatePlan(inp, r.plan)).toEqual([]);
	return r.plan;
}

// Enough types and pieces that a 60 ms budget cuts the search short.
const items = [
	carton('a', 310, 270, 190, 60),
	carton('b', 450, 220, 160, 50),
	carton('c', 180, 180, 180, 80),
	carton('d', 520, 330, 240, 30),
	carton('e', 260, 140, 120, 90)
];
const container = box('c', 2400, 1300, 1200);

describe('work budget (determinism on any machine)', () => {
	afterEach(() => vi.restoreAllMocks());

	it('gives the same plan when the clock runs four times faster (a slower machine)', () => {
		const inp = input(items, [container], { timeBudgetMs: 60 });
		const a = plan(inp);
		expect(a.search.stoppedBy).toBe('work');
		const now = performance.now.bind(performance);
		const t0 = now();
		vi.spyOn(performance, 'now').mockImplementation(() => t0 + (now() - t0) * 4);
		const b = plan(inp);
		expect(b.search.stoppedBy).toBe('work');
		expect(b.containers).toEqual(a.containers);
		expect(b.search.workUsed).toBe(a.search.workUsed);
	});

	it('gives the same plan for a time budget and the equivalent work budget', () => {
		const a = plan(input(items, [container], { timeBudgetMs: 60 }));
		const b = plan(
			input(items, [container], { timeBudgetMs: 10_000, workBudget: 60 * WORK_PER_MS })
		);
		expect(b.search.workBudget).toBe(a.search.workBudget);
		expect(b.containers).toEqual(a.containers);
	});

	it('stops at the wall-clock safety net and says so', () => {
		const now = performance.now.bind(performance);
		const t0 = now();
		// A clock that jumps an hour per reading: every check after the first is past the net.
		let calls = 0;
		vi.spyOn(performance, 'now').mockImplementation(() => t0 + calls++ * 3_600_000);
		const p = plan(input(items, [container], { timeBudgetMs: 60 }));
		expect(p.search.stoppedBy).toBe('time');
	});
});
