import { describe, expect, it } from 'vitest';
import type { LoadPlanInput, LoadPlanProgress } from '../../load-plan';
import { runLoadPlan } from './runner';

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
		expect(outcome.result.plan.containers[0]!.pieces).toBe(2);
		expect(outcome.result.plan.unplaced).toEqual([
			{ itemTypeId: 'cube', count: 1, reason: 'no space left in the container' }
		]);
		expect(progress.every((p) => p.total === 3)).toBe(true);
	});

	it('runs jobs one after another and gives each its own result', async () => {
		const a = runLoadPlan(input);
		const b = runLoadPlan({ ...input, options: { ...input.options, maxContainers: 2 } });
		const [ra, rb] = await Promise.all([a, b]);
		expect(ra.ok && ra.result.ok && ra.result.plan.containers.length).toBe(1);
		expect(rb.ok && rb.result.ok && rb.result.plan.containers.length).toBe(2);
	});

	it('stops a worker that overruns its time with a plain message', async () => {
		const outcome = await runLoadPlan({ ...input, options: { timeBudgetMs: 1 } }, () => {}, {
			graceMs: 0
		});
		expect(outcome).toMatchObject({ ok: false, code: 'timeout' });
		if (!outcome.ok) expect(outcome.message).toMatch(/did not finish within/);
	});

	it('reports a worker that cannot start instead of throwing', async () => {
		const bad = { ...input, options: { onProgress: () => {} } } as LoadPlanInput;
		const outcome = await runLoadPlan(bad);
		expect(outcome).toMatchObject({ ok: false, code: 'crashed' });
	});
});
