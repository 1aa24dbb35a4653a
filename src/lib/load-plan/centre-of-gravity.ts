/**
 * Centre of gravity of the cargo in one container, and the warnings when it sits too far from
 * the middle.
 *
 * Longitudinal limit: IMO/ILO/UNECE Code of Practice for Packing of Cargo Transport Units (CTU
 * Code, 2014; MSC.1/Circ.1497), annex 7, section 3.1.4: the centre of gravity of the cargo should
 * in general lie within ±5 % of the length from the middle; up to ±10 % may be accepted only in
 * special circumstances. Read in a secondary source quoting that section (Roth & Schenk,
 * "Weight distribution according to CTU code: 5 % or 10 % or 60/40?", rothschenk.de); the Code's
 * own page was not reachable here.
 * Transverse limit: 5 % of the width, "from memory" (the Code asks for the centre of gravity near
 * the centre line; the exact figure was not found).
 */
import Decimal from 'decimal.js';
import type { CentreOfGravity } from './types';

export const LONGITUDINAL_LIMIT = new Decimal('0.05');
export const LONGITUDINAL_SPECIAL_LIMIT = new Decimal('0.10');
/** From memory, see above. */
export const TRANSVERSE_LIMIT = new Decimal('0.05');

export interface MassPoint {
	weightKg: string;
	/** Centre of the piece, mm (may end in .5). */
	cx: number;
	cy: number;
	cz: number;
}

function mm1(d: Decimal): number {
	return d.toDecimalPlaces(1, Decimal.ROUND_HALF_UP).toNumber();
}

/**
 * Mass and first moments, exact: Σw and Σw·c. Pieces of one weight are summed first (their
 * doubled centres are whole numbers, exact in floating point), so the decimal work is per weight,
 * not per piece; Σw·c = Σ over weights of w · Σc, the same figure.
 */
function moments(points: readonly MassPoint[]) {
	const byWeight = new Map<string, { n: number; x2: number; y2: number; z2: number }>();
	for (const p of points) {
		const x2 = 2 * p.cx;
		const y2 = 2 * p.cy;
		const z2 = 2 * p.cz;
		if (!Number.isInteger(x2) || !Number.isInteger(y2) || !Number.isInteger(z2)) {
			return pieceMoments(points);
		}
		const sum = byWeight.get(p.weightKg);
		if (sum) {
			sum.n++;
			sum.x2 += x2;
			sum.y2 += y2;
			sum.z2 += z2;
		} else byWeight.set(p.weightKg, { n: 1, x2, y2, z2 });
	}
	let m = new Decimal(0);
	let mx = new Decimal(0);
	let my = new Decimal(0);
	let mz = new Decimal(0);
	for (const [weight, sum] of byWeight) {
		const w = new Decimal(weight);
		m = m.plus(w.times(sum.n));
		mx = mx.plus(w.times(sum.x2).dividedBy(2));
		my = my.plus(w.times(sum.y2).dividedBy(2));
		mz = mz.plus(w.times(sum.z2).dividedBy(2));
	}
	return { m, mx, my, mz };
}

/** The same moments piece by piece (centres that are not whole or half millimetres). */
function pieceMoments(points: readonly MassPoint[]) {
	let m = new Decimal(0);
	let mx = new Decimal(0);
	let my = new Decimal(0);
	let mz = new Decimal(0);
	for (const p of points) {
		const w = new Decimal(p.weightKg);
		m = m.plus(w);
		mx = mx.plus(w.times(p.cx));
		my = my.plus(w.times(p.cy));
		mz = mz.plus(w.times(p.cz));
	}
	return { m, mx, my, mz };
}

export function centreOfGravity(
	points: readonly MassPoint[],
	lengthMm: number,
	widthMm: number
): CentreOfGravity | null {
	const { m, mx, my, mz } = moments(points);
	if (m.isZero()) return null;
	const x = mx.dividedBy(m);
	const y = my.dividedBy(m);
	const dx = x.minus(lengthMm / 2);
	const dy = y.minus(widthMm / 2);
	return {
		xMm: mm1(x),
		yMm: mm1(y),
		zMm: mm1(mz.dividedBy(m)),
		longitudinalOffsetMm: mm1(dx),
		transverseOffsetMm: mm1(dy),
		longitudinalOffsetShare: dx.abs().dividedBy(lengthMm).toFixed(4, Decimal.ROUND_HALF_UP),
		transverseOffsetShare: dy.abs().dividedBy(widthMm).toFixed(4, Decimal.ROUND_HALF_UP)
	};
}

function pct(share: string): string {
	return `${new Decimal(share).times(100).toFixed(1)} %`;
}

/** Warnings for a centre of gravity beyond the limits above (empty when within). */
export function centreOfGravityWarnings(cog: CentreOfGravity | null): string[] {
	if (cog === null) return [];
	const out: string[] = [];
	const lon = new Decimal(cog.longitudinalOffsetShare);
	if (lon.greaterThan(LONGITUDINAL_LIMIT)) {
		const towards = cog.longitudinalOffsetMm > 0 ? 'the door' : 'the front wall';
		const special = lon.greaterThan(LONGITUDINAL_SPECIAL_LIMIT)
			? ' and beyond the 10 % accepted only in special circumstances'
			: '';
		out.push(
			`The centre of gravity is ${Math.abs(cog.longitudinalOffsetMm)} mm (${pct(cog.longitudinalOffsetShare)} of the length) from the middle towards ${towards}: beyond the 5 % the CTU Code (annex 7, 3.1.4) allows in general${special}. Spread the load or ask the carrier.`
		);
	}
	const tr = new Decimal(cog.transverseOffsetShare);
	if (tr.greaterThan(TRANSVERSE_LIMIT)) {
		const side = cog.transverseOffsetMm > 0 ? 'right' : 'left';
		out.push(
			`The centre of gravity is ${Math.abs(cog.transverseOffsetMm)} mm (${pct(cog.transverseOffsetShare)} of the width) off the centre line towards the ${side} wall; keep it near the centre line (CTU Code, annex 7) and ask the carrier.`
		);
	}
	return out;
}
