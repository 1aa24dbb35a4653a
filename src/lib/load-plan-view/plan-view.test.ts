import { describe, expect, it } from 'vitest';
import type { LoadPlan } from '../load-plan';
import type { LoadItemInfo } from '../load-plan-input';
import { PRODUCT_COLOURS } from './palette';
import { planPicture, stepText } from './plan-view';

const info: LoadItemInfo[] = [
	{ id: 'L1-C1', sku: 'A', kind: 'carton', line: 1, numbers: 'cartons 1–2', first: 1, count: 2 },
	{ id: 'L1-C3', sku: 'A', kind: 'carton', line: 1, numbers: 'carton 3', first: 3, count: 1 },
	{ id: 'L2-C4', sku: 'B', kind: 'carton', line: 2, numbers: 'cartons 4–5', first: 4, count: 2 }
];

const at = (itemTypeId: string, x: number) => ({
	itemTypeId,
	x,
	y: 0,
	z: 0,
	lengthMm: 100,
	widthMm: 100,
	heightMm: 100,
	orientation: 'LWH' as const
});

const container = (index: number, placements: ReturnType<typeof at>[]) => ({
	index,
	containerTypeId: 'C20GP',
	placements,
	pieces: placements.length,
	loadedVolumeM3: '0',
	volumeUtilisation: '0',
	payloadKg: '0',
	payloadUtilisation: '0',
	centreOfGravity: null,
	warnings: []
});

const plan: LoadPlan = {
	containers: [
		container(1, [at('L2-C4', 0), at('L1-C1', 100), at('L1-C3', 200)]),
		container(2, [at('L1-C1', 0), at('L2-C4', 100)])
	],
	containerCounts: [{ containerTypeId: 'C20GP', count: 2 }],
	totalCost: null,
	unplaced: [],
	search: { elapsedMs: 1, stoppedBy: 'complete', timeBudgetMs: 3000, seed: 1 }
};

describe('planPicture', () => {
	it('numbers each piece as on the packing list, across containers', () => {
		const p = planPicture(plan, info);
		expect(p.containers[0]!.steps.map((s) => s.number)).toEqual([4, 1, 3]);
		expect(p.containers[1]!.steps.map((s) => s.number)).toEqual([2, 5]);
	});

	it('colours by product, the same in every container, with a legend per container', () => {
		const p = planPicture(plan, info);
		expect(p.colours.get('A')).toBe(PRODUCT_COLOURS[0]);
		expect(p.containers[0]!.boxes[0]!.colour).toBe(PRODUCT_COLOURS[1]);
		expect(p.containers[0]!.legend).toEqual([
			{ sku: 'B', count: 1, colour: PRODUCT_COLOURS[1] },
			{ sku: 'A', count: 2, colour: PRODUCT_COLOURS[0] }
		]);
	});

	it('words a step with its place', () => {
		const step = planPicture(plan, info).containers[0]!.steps[1]!;
		expect(stepText(step, 2, 3)).toBe('Step 2 of 3: A carton 1 (line 1) at x 100, y 0, z 0 mm');
	});
});
