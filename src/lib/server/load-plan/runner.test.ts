import { describe, expect, it } from 'vitest';
import { DEFAULT_TIME_BUDGET_MS, type LoadPlanInput, type LoadPlanProgress } from '../../load-plan';
import { MAX_QUEUED_BUDGET_MS, runLoadPlan } from './runner';
import { planOf } from './run-result';

// 1 m cubes into a 2 × 1 × 1 m box: exactly two fit (arithmetic).
const input: LoadPlanInput = {
	items: [
		{
			id: 'cube',
			label: 'Cube',
			lengthMm: 1000,
			widthMm: 1000,
			heightMm: 1000,
			weightKg: '10',
			count: 3,
			orientations: 'any'
		}
	],
	containers: [
		{
			id: 'box',
			lengthMm: 2000,
			widthMm: 1000,
			heightMm: 1000,
			doorWidthMm: 1000,
			doorHeightMm: 1000,
			maxPayloadKg: '1000'
		}
	],
	options: { maxContainers: 1, timeBudgetMs: 500 }
};

describe('runLoadPlan (worker thread)', () => {
	it('plans in a worker and reports progress', async () => {
		const progress: LoadPlanProgress[] = [];
		const outcome = await runLoadPlan(input, (p) => progress.push(p));
		expect(outcome.ok).toBe(true);
		if (!outcome.ok || !outcome.result.ok) throw new Error('no plan');
		expect(planOf(outcome.result).containers[0]!.pieces).toBe(2);
		expect(planOf(outcome.result).unplaced).toEqual([
			{ itemTypeId: 'cube', count: 1, reason: 'no space left in the container' }
		]);
		expect(progress.every((p) => p.total === 3)).toBe(true);
	});

	it('runs jobs one after another and gives each its own result', async () => {
		const a = runLoadPlan(input);
		const b = runLoadPlan({ ...input, options: { ...input.options, maxContainers: 2 } });
		const [ra, rb] = await Promise.all([a, b]);
		expect(ra.ok && ra.result.ok && planOf(ra.result).containers.length).toBe(1);
		expect(rb.ok && rb.result.ok && planOf(rb.result).containers.length).toBe(2);
	});

	it('stops a worker that overruns its time with a plain message, and uses a new one next', async () => {
		// 2,000 small cubes take the planner far longer than the 1 ms allowed (the worker kept from
		// the jobs before is warm, so a tiny job could beat the timer).
		const big: LoadPlanInput = {
			items: [{ ...input.items[0]!, lengthMm: 100, widthMm: 100, heightMm: 100, count: 2000 }],
			containers: input.containers,
			options: { timeBudgetMs: 1 }
		};
		const outcome = await runLoadPlan(big, () => {}, { graceMs: 0 });
		expect(outcome).toMatchObject({ ok: false, code: 'timeout' });
		if (!outcome.ok) expect(outcome.message).toMatch(/did not finish within/);
		const next = await runLoadPlan(input);
		expect(next.ok && next.result.ok && planOf(next.result).containers[0]!.pieces).toBe(2);
	});

	it('reports a worker that cannot start instead of throwing', async () => {
		const bad = { ...input, options: { onProgress: () => {} } } as LoadPlanInput;
		const outcome = await runLoadPlan(bad);
		expect(outcome).toMatchObject({ ok: false, code: 'crashed' });
		expect((await runLoadPlan(input)).ok).toBe(true);
	});

	it('refuses jobs beyond the queued search time, with a plain message', async () => {
		// Asked at once, all wait (none has started): eight 3 s searches fill the 24 s allowed.
		const slow = { ...input, options: { ...input.options, timeBudgetMs: DEFAULT_TIME_BUDGET_MS } };
		const jobs = Array.from({ length: 11 }, () => runLoadPlan(slow));
		const outcomes = await Promise.all(jobs);
		const refused = outcomes.filter((o) => !o.ok);
		expect(refused.length).toBeGreaterThan(0);
		expect(refused[0]).toMatchObject({ ok: false, code: 'busy' });
		expect(outcomes.filter((o) => o.ok).length).toBe(MAX_QUEUED_BUDGET_MS / DEFAULT_TIME_BUDGET_MS);
		// Twenty 200 ms searches ask for 4 s in all: every one waits its turn.
		const quick = { ...input, options: { ...input.options, timeBudgetMs: 200 } };
		const many = await Promise.all(Array.from({ length: 20 }, () => runLoadPlan(quick)));
		expect(many.every((o) => o.ok)).toBe(true);
	});
});
