import { describe, expect, it } from 'vitest';
import { centreOfGravity, centreOfGravityWarnings } from './centre-of-gravity';

describe('centreOfGravity', () => {
	it('is the mass-weighted mean of the piece centres', () => {
		const cog = centreOfGravity(
			[
				{ weightKg: '100', cx: 1000, cy: 1000, cz: 500 },
				{ weightKg: '300', cx: 3000, cy: 1000, cz: 500 }
			],
			6000,
			2000
		)!;
		expect(cog.xMm).toBe(2500);
		expect(cog.longitudinalOffsetMm).toBe(-500);
		expect(cog.longitudinalOffsetShare).toBe('0.0833');
		expect(cog.transverseOffsetMm).toBe(0);
	});

	it('gives the same figure whether pieces of one weight are summed first or one by one', () => {
		// Arithmetic: (3 × 12.345 × 1000.5 + 7.1 × 4000) / (3 × 12.345 + 7.1) = 1483.0297… mm.
		const half = [1000.5, 1000.5, 1000.5].map((cx) => ({ weightKg: '12.345', cx, cy: 0, cz: 0 }));
		const heavy = { weightKg: '7.1', cx: 4000, cy: 0, cz: 0 };
		expect(centreOfGravity([...half, heavy], 6000, 2000)!.xMm).toBe(1483);
		// A centre that is not a whole or half millimetre takes the piece-by-piece path.
		const odd = { weightKg: '1', cx: 0.25, cy: 0, cz: 0 };
		const both = centreOfGravity([odd, { ...odd, cx: 0.75 }], 6000, 2000)!;
		expect(both.xMm).toBe(0.5);
	});

	it('is null for massless cargo', () => {
		expect(centreOfGravity([{ weightKg: '0', cx: 1, cy: 1, cz: 1 }], 10, 10)).toBeNull();
	});
});

describe('centreOfGravityWarnings', () => {
	// CTU Code 2014 (IMO/ILO/UNECE, MSC.1/Circ.1497), annex 7, section 3.1.4: within ±5 % of the
	// length in general, ±10 % only in special circumstances (read in a secondary source quoting
	// the section: Roth & Schenk, rothschenk.de, "Weight distribution according to CTU code").
	const at = (share: string, offset: number) => ({
		xMm: 0,
		yMm: 0,
		zMm: 0,
		longitudinalOffsetMm: offset,
		transverseOffsetMm: 0,
		longitudinalOffsetShare: share,
		transverseOffsetShare: '0.0000'
	});

	it('says nothing within 5 % of the length', () => {
		expect(centreOfGravityWarnings(at('0.0500', 300))).toEqual([]);
	});

	it('warns beyond 5 %, and says when beyond 10 % too', () => {
		const [w] = centreOfGravityWarnings(at('0.0600', 354));
		expect(w).toMatch(/towards the door.*CTU Code \(annex 7, 3\.1\.4\)/);
		expect(w).not.toMatch(/10 %/);
		expect(centreOfGravityWarnings(at('0.1200', -700))[0]).toMatch(/front wall.*10 %/);
	});

	it('warns when off the centre line beyond 5 % of the width (from memory)', () => {
		const cog = { ...at('0.0000', 0), transverseOffsetMm: 200, transverseOffsetShare: '0.0850' };
		expect(centreOfGravityWarnings(cog)[0]).toMatch(/right wall/);
	});
});
