import { describe, expect, it } from 'vitest';
import { box, carton, input } from './test-fixtures';
import type { LoadPlan, Placement } from './types';
import { validatePlan } from './validate-plan';

const at = (x: number, y: number, z: number, id = 'a', l = 100, w = 100, h = 100): Placement => ({
	itemTypeId: id,
	x,
	y,
	z,
	lengthMm: l,
	widthMm: w,
	heightMm: h,
	orientation: 'LWH'
});

function planOf(placements: Placement[], unplaced: LoadPlan['unplaced'] = []): LoadPlan {
	return {
		containers: [
			{
				index: 1,
				containerTypeId: 'c',
				placements,
				pieces: placements.length,
				loadedVolumeM3: '0',
				volumeUtilisation: '0',
				payloadKg: '0',
				payloadUtilisation: '0',
				centreOfGravity: null,
				warnings: []
			}
		],
		containerCounts: [{ containerTypeId: 'c', count: 1 }],
		totalCost: null,
		unplaced,
		search: { elapsedMs: 0, stoppedBy: 'complete', timeBudgetMs: 1, seed: 1 }
	};
}

const rules = (v: { rule: string }[]) => v.map((x) => x.rule);

describe('validatePlan', () => {
	const inp = input([carton('a', 100, 100, 100, 2)], [box('c', 300, 300, 300, '25')]);

	it('accepts a valid plan', () => {
		expect(validatePlan(inp, planOf([at(0, 0, 0), at(0, 0, 100)]))).toEqual([]);
	});

	it('finds overlaps, pieces outside, and unsupported pieces', () => {
		expect(rules(validatePlan(inp, planOf([at(0, 0, 0), at(50, 50, 0)])))).toEqual(['overlap']);
		expect(rules(validatePlan(inp, planOf([at(0, 0, 0), at(250, 0, 0)])))).toEqual(['bounds']);
		expect(rules(validatePlan(inp, planOf([at(0, 0, 0), at(50, 0, 100)])))).toEqual(['support']);
	});

	it('accepts partial support down to the configured share', () => {
		const half = { ...inp, options: { supportShare: 0.5 } };
		expect(validatePlan(half, planOf([at(0, 0, 0), at(50, 0, 100)]))).toEqual([]);
		expect(rules(validatePlan(half, planOf([at(0, 0, 0), at(60, 0, 100)])))).toEqual(['support']);
	});

	it('finds a wrong orientation, a forbidden one, and the door', () => {
		const up = input(
			[{ ...carton('a', 100, 100, 200, 1), orientations: 'thisWayUp' }],
			[{ ...box('c', 300, 300, 300), doorHeightMm: 150 }]
		);
		const laid: Placement = { ...at(0, 0, 0, 'a', 200, 100, 100), orientation: 'HLW' };
		expect(rules(validatePlan(up, planOf([laid])))).toEqual(['orientation']);
		const wrong: Placement = { ...at(0, 0, 0, 'a', 100, 100, 100) };
		expect(rules(validatePlan(up, planOf([wrong])))).toEqual(['orientation']);
		const standing = at(0, 0, 0, 'a', 100, 100, 200);
		expect(rules(validatePlan(up, planOf([standing])))).toEqual(['door']);
	});

	it('counts the mass of everything above, through pieces in between', () => {
		// Three high: the bottom carton carries 20 kg, the middle 10 kg.
		const stack = input(
			[{ ...carton('a', 100, 100, 100, 3), maxLoadOnTopKg: '15' }],
			[box('c', 300, 300, 300)]
		);
		const v = validatePlan(stack, planOf([at(0, 0, 0), at(0, 0, 100), at(0, 0, 200)]));
		expect(rules(v)).toEqual(['stacking']);
		expect(v[0]!.placement).toBe(0);
	});

	it('refuses anything on a piece that is not stackable', () => {
		const flat = input(
			[{ ...carton('a', 100, 100, 100, 2), stackable: false }],
			[box('c', 300, 300, 300)]
		);
		expect(rules(validatePlan(flat, planOf([at(0, 0, 0), at(0, 0, 100)])))).toEqual(['stacking']);
	});

	it('checks the payload with decimal sums and the piece counts', () => {
		const heavy = input(
			[{ ...carton('a', 100, 100, 100, 2), weightKg: '7.6' }],
			[box('c', 300, 300, 300, '15.1')]
		);
		expect(rules(validatePlan(heavy, planOf([at(0, 0, 0), at(100, 0, 0)])))).toEqual(['payload']);
		expect(rules(validatePlan(inp, planOf([at(0, 0, 0)])))).toEqual(['count']);
		const told = planOf([at(0, 0, 0)], [{ itemTypeId: 'a', count: 1, reason: 'no space left' }]);
		expect(validatePlan(inp, told)).toEqual([]);
	});
});
