import { describe, expect, it } from 'vitest';
import { placeInSpaces, type Space } from './spaces';

const min = { x: 10, y: 10, z: 10 };
const all: Space = { x1: 0, y1: 0, z1: 0, x2: 100, y2: 50, z2: 40, p: -1 };

describe('placeInSpaces', () => {
	it('keeps the spaces beside a block on the floor and opens one only on its packing area', () => {
		const top: Space = { x1: 0, y1: 0, z1: 20, x2: 30, y2: 20, z2: 40, p: 0 };
		const out = placeInSpaces([all], 0, 0, 0, 30, 20, 20, top, min);
		expect(out).toEqual([
			{ x1: 30, y1: 0, z1: 0, x2: 100, y2: 50, z2: 40, p: -1 },
			{ x1: 0, y1: 20, z1: 0, x2: 100, y2: 50, z2: 40, p: -1 },
			top
		]);
	});

	it('drops spaces too small for any box and spaces inside others', () => {
		const out = placeInSpaces([all], 0, 0, 0, 95, 20, 20, null, min);
		expect(out).toEqual([{ x1: 0, y1: 20, z1: 0, x2: 100, y2: 50, z2: 40, p: -1 }]);
	});

	it('leaves spaces the block does not touch', () => {
		const far: Space = { x1: 200, y1: 0, z1: 0, x2: 300, y2: 50, z2: 40, p: -1 };
		expect(placeInSpaces([far], 0, 0, 0, 30, 20, 20, null, min)).toEqual([far]);
	});
});
