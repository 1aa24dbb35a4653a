import { describe, expect, it } from 'vitest';
import { allowedExtents, extentOf } from './orientations';

describe('allowedExtents', () => {
	it('gives six extents for a piece with three different sides', () => {
		expect(allowedExtents(3, 2, 1, 'any')).toHaveLength(6);
	});

	it('keeps the height vertical for this way up', () => {
		const ex = allowedExtents(3, 2, 1, 'thisWayUp');
		expect(ex.map((e) => e.orientation)).toEqual(['LWH', 'WLH']);
		expect(ex.every((e) => e.dz === 1)).toBe(true);
	});

	it('reads the per-axis flags as in the BR data (flag k: dimension k may stand vertical)', () => {
		// br1.txt instance 1, type 2: 110 0 43 1 25 1 → 43 or 25 vertical (data README, format).
		const ex = allowedExtents(110, 43, 25, { lengthUp: false, widthUp: true, heightUp: true });
		expect(new Set(ex.map((e) => e.dz))).toEqual(new Set([43, 25]));
		expect(ex).toHaveLength(4);
	});

	it('lists equal extents once', () => {
		expect(allowedExtents(2, 2, 2, 'any')).toHaveLength(1);
		expect(allowedExtents(2, 2, 1, 'any')).toHaveLength(3);
	});

	it('maps orientation letters to axes', () => {
		expect(extentOf('HLW', 30, 20, 10)).toEqual([10, 30, 20]);
	});
});
