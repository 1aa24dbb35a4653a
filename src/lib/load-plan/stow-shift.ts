/**
 * Part loads: the search stows from the front wall, so cargo that does not fill the length has
 * its centre of gravity towards the front, beyond the CTU Code's 5 % (annex 7, 3.1.4) for most
 * part loads. The whole stow is therefore moved towards the door by one distance (the same for
 * every piece, so overlaps, support and stacking are unchanged) that brings the centre of
 * gravity as near the middle as the free length allows; across, likewise when the stow is
 * narrower than the container.
 *
 * The price is a gap at the front wall: the wall no longer blocks the cargo against forward
 * forces, so the gap must be filled or braced. The CTU Code (annex 7, 1.2) asks for either a
 * tight stow against the side and front walls or a "secured stow" that is blocked and/or lashed
 * within the unit (blocking and bracing: annex 7, section 2.3); read on the UNECE CTU Code wiki
 * (wiki.unece.org, "Planning of packing", 2014 text). We choose the balanced stow by default —
 * a centre of gravity off the middle overloads one end of the chassis or the spreader, which the
 * packer cannot correct later, while a gap can be braced — and say so in a warning; the
 * `stowAt: 'frontWall'` option keeps the stow against the front wall.
 */
import type { CentreOfGravity } from './types';

export interface Extent1 {
	/** Lowest and highest coordinate the stow occupies along the axis, mm. */
	lo: number;
	hi: number;
}

/**
 * Whole-millimetre shift along one axis that brings `cog` (mm) nearest `size / 2`, keeping the
 * stow [lo, hi] inside [0, size].
 */
export function balancingShift(cog: number, size: number, stow: Extent1): number {
	const want = Math.round(size / 2 - cog);
	return Math.max(0 - stow.lo, Math.min(size - stow.hi, want));
}

/** The note that comes with a shift towards the door. */
export function frontGapWarning(gapMm: number): string {
	return `The stow starts ${gapMm} mm from the front wall to bring the centre of gravity to the middle: fill or brace that gap (dunnage, timber bracing or air bags) so the cargo cannot slide forward, as a secured stow in the CTU Code (annex 7, 1.2 and 2.3), or load it against the front wall and secure it at the door instead.`;
}

/** Shift of the stow's placements: x towards the door, y towards the right wall. */
export interface StowShift {
	xMm: number;
	yMm: number;
}

export function stowShift(
	cog: CentreOfGravity | null,
	L: number,
	W: number,
	x: Extent1,
	y: Extent1
): StowShift {
	if (cog === null) return { xMm: 0, yMm: 0 };
	return { xMm: balancingShift(cog.xMm, L, x), yMm: balancingShift(cog.yMm, W, y) };
}
