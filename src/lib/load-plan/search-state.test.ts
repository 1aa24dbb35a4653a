import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import type { CoreProblem } from './core-types';
import { reach } from './search-state';

/** The gap table by its definition: the largest sum of box extents (any number of each) ≤ g. */
function naive(lengths: number[], size: number): number[] {
	const ok = Array.from({ length: size + 1 }, (_, g) => g === 0);
	for (let g = 1; g <= size; g++) ok[g] = lengths.some((l) => l > 0 && l <= g && ok[g - l]);
	const fill: number[] = [];
	for (let g = 0; g <= size; g++) fill.push(ok[g] ? g : fill[g - 1]!);
	return fill;
}

function problem(sides: [number, number, number][], L: number, W: number, H: number) {
	return {
		container: { L, W, H, payload: 1e9 },
		types: sides.map(([dx, dy, dz]) => ({ extents: [{ dx, dy, dz }], count: 1 }))
	} as unknown as CoreProblem;
}

describe('reach (gap tables)', () => {
	it('matches the definition for short and long sides, multiples of 32 among them', () => {
		const side = fc.oneof(
			fc.integer({ min: 1, max: 40 }),
			fc.integer({ min: 30, max: 700 }),
			fc.constantFrom(32, 64, 96, 320)
		);
		fc.assert(
			fc.property(
				fc.array(fc.tuple(side, side, side), { minLength: 1, maxLength: 4 }),
				fc.integer({ min: 1, max: 2500 }),
				fc.integer({ min: 1, max: 700 }),
				(sides, L, H) => {
					const p = problem(sides, L, 97, H);
					const r = reach(p, Int32Array.from(sides.map(() => 1)));
					expect([...r.x]).toEqual(
						naive(
							sides.map((s) => s[0]),
							L
						)
					);
					expect([...r.y]).toEqual(
						naive(
							sides.map((s) => s[1]),
							97
						)
					);
					expect([...r.z]).toEqual(
						naive(
							sides.map((s) => s[2]),
							H
						)
					);
				}
			),
			{ numRuns: 200 }
		);
	});

	it('leaves out the sides of types with none left', () => {
		const p = problem(
			[
				[300, 300, 300],
				[250, 250, 250]
			],
			1000,
			1000,
			1000
		);
		const r = reach(p, Int32Array.from([1, 0]));
		expect(r.x[999]).toBe(900);
	});
});
