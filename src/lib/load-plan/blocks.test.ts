import { describe, expect, it } from 'vitest';
import { MIN_FILL, generateBlocks } from './blocks';
import { NO_LOAD, type CoreBoxType } from './core-types';
import { allowedExtents } from './orientations';
import { meter } from './work-budget';

const container = { L: 600, W: 400, H: 300, payload: Infinity };
const type = (l: number, w: number, h: number, count: number, cap = Infinity): CoreBoxType => ({
	extents: allowedExtents(l, w, h, 'thisWayUp'),
	count,
	weight: 10,
	cap,
	volume: l * w * h
});
const limits = { maxBlocks: 5000, meter: meter(Infinity, Infinity), maxWork: Infinity };

describe('generateBlocks', () => {
	it('never uses more boxes of a type than there are', () => {
		const types = [type(100, 100, 100, 5), type(200, 100, 100, 3)];
		for (const b of generateBlocks(types, container, limits)) {
			b.types.forEach((t, i) => expect(b.nums[i]).toBeLessThanOrEqual(types[t]!.count));
		}
	});

	it('keeps general blocks at least MIN_FILL full and inside the container', () => {
		const blocks = generateBlocks([type(100, 90, 80, 6), type(95, 90, 80, 6)], container, limits);
		expect(blocks.some((b) => b.kind !== 0)).toBe(true);
		for (const b of blocks) {
			expect(b.vol).toBeGreaterThanOrEqual(MIN_FILL * b.dx * b.dy * b.dz - 1e-9);
			expect(b.dx <= 600 && b.dy <= 400 && b.dz <= 300).toBe(true);
			expect(b.ax <= b.dx && b.ay <= b.dy).toBe(true);
		}
	});

	it('stacks a type only as high as its load limit allows, and not at all when not stackable', () => {
		// 10 kg each (weight 10 mg units here), limit 20: at most three high.
		const capped = generateBlocks([type(100, 100, 100, 9, 20)], container, limits);
		expect(Math.max(...capped.map((b) => b.dz))).toBe(300);
		const flat = generateBlocks([type(100, 100, 100, 9, NO_LOAD)], container, limits);
		expect(flat.every((b) => b.dz === 100 && b.cap === NO_LOAD)).toBe(true);
	});

	it('sorts by box volume, largest first', () => {
		const blocks = generateBlocks([type(100, 100, 100, 8)], container, limits);
		for (let i = 1; i < blocks.length; i++) {
			expect(blocks[i - 1]!.vol).toBeGreaterThanOrEqual(blocks[i]!.vol);
		}
	});
});
