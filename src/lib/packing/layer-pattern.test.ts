import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { layerPattern, layerRectangles, type LayerPattern } from './layer-pattern';

/** Every carton inside the pallet, none overlapping, as many as the count says. */
function expectValidLayout(pattern: LayerPattern): void {
	const { palletLengthMm: L, palletWidthMm: W } = pattern;
	const rects = layerRectangles(pattern);
	expect(rects).toHaveLength(pattern.count);
	const [a, b] = pattern.footprintMm;
	const grid = new Uint8Array(L * W);
	for (const r of rects) {
		expect([`${r.lengthMm}×${r.widthMm}`, `${r.widthMm}×${r.lengthMm}`]).toContain(`${a}×${b}`);
		expect(r.xMm).toBeGreaterThanOrEqual(0);
		expect(r.yMm).toBeGreaterThanOrEqual(0);
		expect(r.xMm + r.lengthMm).toBeLessThanOrEqual(L);
		expect(r.yMm + r.widthMm).toBeLessThanOrEqual(W);
		for (let x = r.xMm; x < r.xMm + r.lengthMm; x++) {
			for (let y = r.yMm; y < r.yMm + r.widthMm; y++) {
				if (grid[x * W + y] === 1) throw new Error(`overlap at ${x},${y}`);
				grid[x * W + y] = 1;
			}
		}
	}
}

/** Best guillotine count by brute force over every whole-number cut (small sizes only). */
function bruteGuillotine(L: number, W: number, a: number, b: number): number {
	const memo = new Map<number, number>();
	const g = (x: number, y: number): number => {
		const key = x * 10_000 + y;
		const known = memo.get(key);
		if (known !== undefined) return known;
		let best = Math.max(
			Math.floor(x / a) * Math.floor(y / b),
			Math.floor(x / b) * Math.floor(y / a)
		);
		for (let c = 1; c < x; c++) best = Math.max(best, g(c, y) + g(x - c, y));
		for (let c = 1; c < y; c++) best = Math.max(best, g(x, c) + g(x, y - c));
		memo.set(key, best);
		return best;
	};
	return g(L, W);
}

/** Best of the blocks and every one-cut split into two blocks, by brute force. */
function bruteTwoBlock(L: number, W: number, a: number, b: number): number {
	const block = (x: number, y: number): number =>
		Math.max(Math.floor(x / a) * Math.floor(y / b), Math.floor(x / b) * Math.floor(y / a));
	let best = block(L, W);
	for (let x = 1; x < L; x++) best = Math.max(best, block(x, W) + block(L - x, W));
	for (let y = 1; y < W; y++) best = Math.max(best, block(L, y) + block(L, W - y));
	return best;
}

describe('hand-checkable layers', () => {
	it('puts 8 cartons of 400 × 300 mm on a 1200 × 800 EUR pallet', () => {
		// ISO 3394:2012, the 600 × 400 mm module, of which 400 × 300 is a sub-module: the EUR pallet
		// takes two modules, eight 400 × 300 cartons (from memory; common practice).
		// Hand: turned, 1200 ÷ 300 = 4 along × 800 ÷ 400 = 2 across = 8 = area bound
		// 960,000 ÷ 120,000 = 8. Lengthwise only 1200 ÷ 400 = 3 × 800 ÷ 300 = 2 = 6.
		const p = layerPattern(1200, 800, 400, 300);
		expect(p.count).toBe(8);
		expect(p.areaBound).toBe(8);
		expect(p.blockCounts).toEqual({ lengthwise: 6, turned: 8 });
		expect(p.blocks).toEqual([
			{
				xMm: 0,
				yMm: 0,
				turned: true,
				cartonAlongLengthMm: 300,
				cartonAlongWidthMm: 400,
				columns: 4,
				rows: 2,
				count: 8
			}
		]);
		expectValidLayout(p);
	});

	it('puts 4 modules of 600 × 400 mm on a EUR pallet (ISO 3394 module, from memory)', () => {
		expect(layerPattern(1200, 800, 600, 400).count).toBe(4);
	});

	it('beats both block orientations with two blocks: 500 × 300 mm on 1200 × 800', () => {
		// Blocks: lengthwise 1200 ÷ 500 = 2 × 800 ÷ 300 = 2 → 4; turned 1200 ÷ 300 = 4 × 800 ÷ 500
		// = 1 → 4. Two blocks: a 1200 × 300 strip holds 2 lengthwise (2 × 500 = 1000 ≤ 1200), the
		// remaining 1200 × 500 strip holds 4 turned (4 × 300 = 1200, 500 ≤ 500): 2 + 4 = 6, which is
		// the area bound floor(960,000 ÷ 150,000) = floor(6.4) = 6.
		const p = layerPattern(1200, 800, 500, 300);
		expect(p.blockCounts).toEqual({ lengthwise: 4, turned: 4 });
		expect(p.count).toBe(6);
		expect(bruteTwoBlock(1200, 800, 500, 300)).toBe(6);
		expect(p.areaBound).toBe(6);
		expect(p.blocks.map((b) => [b.turned, b.columns, b.rows])).toEqual([
			[false, 2, 1],
			[true, 4, 1]
		]);
		expectValidLayout(p);
	});

	it('beats both block orientations with two blocks: 600 × 400 mm on 1200 × 1000', () => {
		// Blocks: 2 × 2 = 4 lengthwise; 3 × 1 = 3 turned. Two blocks: a 1200 × 400 strip holds 2
		// lengthwise, the 1200 × 600 strip left holds 3 turned (3 × 400 = 1200): 5 = area bound
		// floor(1,200,000 ÷ 240,000) = 5.
		const p = layerPattern(1200, 1000, 600, 400);
		expect(p.blockCounts).toEqual({ lengthwise: 4, turned: 3 });
		expect(p.count).toBe(5);
		expect(p.blocks).toHaveLength(2);
		expectValidLayout(p);
	});

	it('finds a three-block guillotine layer that beats every two-block one: 300 × 180 on 1200 × 800', () => {
		// Blocks: lengthwise 4 × 4 = 16; turned 6 × 2 = 12. Best two-block is 16 (bruteTwoBlock).
		// Three blocks: x 0–300 a column of 4 lengthwise (4 × 180 = 720 ≤ 800);
		// x 300–1200, y 0–180 a row of 3 lengthwise (3 × 300 = 900); x 300–1200, y 180–780 turned,
		// 5 along (5 × 180 = 900) × 2 across (2 × 300 = 600): 4 + 3 + 10 = 17 = area bound
		// floor(960,000 ÷ 54,000) = floor(17.8) = 17.
		const p = layerPattern(1200, 800, 300, 180);
		expect(bruteTwoBlock(1200, 800, 300, 180)).toBe(16);
		expect(p.count).toBe(17);
		expect(p.areaBound).toBe(17);
		expect(p.method).toBe('guillotine');
		expect(p.blocks.map((b) => b.count).sort((x, y) => x - y)).toEqual([3, 4, 10]);
		expectValidLayout(p);
	});

	it('gives 0 for a footprint that fits in neither orientation', () => {
		const p = layerPattern(1200, 800, 1300, 900);
		expect(p.count).toBe(0);
		expect(p.blocks).toEqual([]);
	});

	it('handles a square carton and a carton equal to the pallet', () => {
		expect(layerPattern(1200, 800, 400, 400).count).toBe(6);
		expect(layerPattern(1200, 800, 1200, 800).count).toBe(1);
		expect(layerPattern(1200, 800, 800, 1200).count).toBe(1);
	});

	it('falls back to two blocks for tiny cartons, still valid and at least the blocks', () => {
		const p = layerPattern(1200, 1000, 53, 37);
		expect(p.method).toBe('two_block');
		expect(p.count).toBeGreaterThanOrEqual(
			Math.max(p.blockCounts.lengthwise, p.blockCounts.turned)
		);
		expect(p.count).toBeLessThanOrEqual(p.areaBound);
		expectValidLayout(p);
	});

	it('returns a fresh copy each time (results are memoised internally)', () => {
		const first = layerPattern(1200, 800, 400, 300);
		first.blocks.length = 0;
		first.count = 0;
		expect(layerPattern(1200, 800, 400, 300).count).toBe(8);
		expect(layerPattern(1200, 800, 400, 300).blocks).toHaveLength(1);
	});

	it('rejects non-integer or non-positive sizes', () => {
		expect(() => layerPattern(1200, 800, 0, 300)).toThrow(RangeError);
		expect(() => layerPattern(1200.5, 800, 400, 300)).toThrow(RangeError);
	});
});

describe('properties', () => {
	it('matches a brute-force guillotine search on small sizes', () => {
		fc.assert(
			fc.property(
				fc.integer({ min: 1, max: 40 }),
				fc.integer({ min: 1, max: 30 }),
				fc.integer({ min: 1, max: 15 }),
				fc.integer({ min: 1, max: 15 }),
				(L, W, a, b) => {
					const p = layerPattern(L, W, a, b);
					expect(p.method).toBe('guillotine');
					expect(p.count).toBe(bruteGuillotine(L, W, a, b));
				}
			),
			{ numRuns: 300 }
		);
	});

	it('lays out valid layers, between the best block and the area bound', () => {
		fc.assert(
			fc.property(
				fc.integer({ min: 100, max: 1300 }),
				fc.integer({ min: 100, max: 1300 }),
				fc.integer({ min: 20, max: 700 }),
				fc.integer({ min: 20, max: 700 }),
				(L, W, a, b) => {
					const p = layerPattern(L, W, a, b);
					expectValidLayout(p);
					expect(p.count).toBeLessThanOrEqual(p.areaBound);
					expect(p.count).toBeGreaterThanOrEqual(
						Math.max(p.blockCounts.lengthwise, p.blockCounts.turned)
					);
				}
			),
			{ numRuns: 60 }
		);
	});
});
