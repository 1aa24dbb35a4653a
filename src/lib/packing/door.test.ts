import { describe, expect, it } from 'vitest';
import { doorProblem, passesDoor, type DoorContainer } from './door';

// Door openings of a typical 20 ft and 40 ft high-cube dry container: 2340 × 2280 mm and
// 2340 × 2585 mm (common practice: carriers' container specification sheets vary by a few mm;
// ISO 1496-1:2013 §5 sets minimum door openings of 2286 mm wide and, for 8 ft 6 in boxes,
// 2261 mm high — from memory).
const C20: DoorContainer = {
	code: '22G1',
	internalLengthMm: 5898,
	internalWidthMm: 2352,
	internalHeightMm: 2393,
	doorWidthMm: 2340,
	doorHeightMm: 2280
};
const C40HC: DoorContainer = {
	code: '45G1',
	internalLengthMm: 12032,
	internalWidthMm: 2352,
	internalHeightMm: 2698,
	doorWidthMm: 2340,
	doorHeightMm: 2585
};

describe('door check', () => {
	it('takes an ordinary carton', () => {
		const box = { lengthMm: 600, widthMm: 400, heightMm: 300, orientation: 'any' as const };
		expect(passesDoor(box, C20)).toBe(true);
		expect(doorProblem(box, [C20, C40HC])).toBeNull();
	});

	it('turns a long carton to go in end-on', () => {
		const crate = { lengthMm: 4000, widthMm: 1200, heightMm: 1000, orientation: 'any' as const };
		expect(passesDoor(crate, C20)).toBe(true);
	});

	it('refuses a this-way-up carton taller than every door, naming the largest opening', () => {
		const tall = {
			lengthMm: 1000,
			widthMm: 800,
			heightMm: 2600,
			orientation: 'this_way_up' as const
		};
		expect(passesDoor(tall, C20)).toBe(false);
		expect(passesDoor(tall, C40HC)).toBe(false);
		expect(doorProblem(tall, [C20, C40HC])).toMatch(/2340 × 2585 mm \(45G1\)/);
		// Laid on its side it would go in: the orientation is what stops it.
		expect(passesDoor({ ...tall, orientation: 'any' }, C20)).toBe(true);
	});

	it('refuses a carton too large in every direction, but not when no container is known', () => {
		const huge = { lengthMm: 2500, widthMm: 2500, heightMm: 2500, orientation: 'any' as const };
		expect(doorProblem(huge, [C20, C40HC])).toMatch(/does not pass the door/);
		expect(doorProblem(huge, [])).toBeNull();
	});

	it('needs the third side within the internal length', () => {
		const pole = { lengthMm: 6000, widthMm: 300, heightMm: 300, orientation: 'any' as const };
		expect(passesDoor(pole, C20)).toBe(false);
		expect(passesDoor(pole, C40HC)).toBe(true);
	});
});
