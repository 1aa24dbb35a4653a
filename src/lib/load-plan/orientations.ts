/**
 * The placed extents (along x, y, z) an item may take under its orientation rule. Pieces with
 * equal dimensions give the same extents in several orientations; each extent is listed once,
 * under the first orientation (in ORIENTATION_ORDER) that gives it.
 */
import type { Orientation, OrientationRule } from './types';

export interface OrientedExtent {
	dx: number;
	dy: number;
	dz: number;
	orientation: Orientation;
}

/** Letters: the item's own dimension along x, y, z. Grouped by the vertical one (H, W, L). */
export const ORIENTATION_ORDER: readonly Orientation[] = ['LWH', 'WLH', 'LHW', 'HLW', 'WHL', 'HWL'];

/** The item's dimension that stands vertical in an orientation. */
export function verticalOf(orientation: Orientation): 'L' | 'W' | 'H' {
	return orientation[2] as 'L' | 'W' | 'H';
}

/** Whether the rule lets that dimension stand vertical. */
export function allowsVertical(rule: OrientationRule, vertical: 'L' | 'W' | 'H'): boolean {
	if (rule === 'any') return true;
	if (rule === 'thisWayUp') return vertical === 'H';
	return vertical === 'L' ? rule.lengthUp : vertical === 'W' ? rule.widthUp : rule.heightUp;
}

/** Extents along x, y, z of a piece L × W × H in the given orientation. */
export function extentOf(
	orientation: Orientation,
	l: number,
	w: number,
	h: number
): [number, number, number] {
	const pick = (i: number) => {
		const c = orientation[i];
		return c === 'L' ? l : c === 'W' ? w : h;
	};
	return [pick(0), pick(1), pick(2)];
}

/** Distinct allowed extents, in ORIENTATION_ORDER. */
export function allowedExtents(
	l: number,
	w: number,
	h: number,
	rule: OrientationRule
): OrientedExtent[] {
	const out: OrientedExtent[] = [];
	for (const orientation of ORIENTATION_ORDER) {
		if (!allowsVertical(rule, verticalOf(orientation))) continue;
		const [dx, dy, dz] = extentOf(orientation, l, w, h);
		if (out.some((e) => e.dx === dx && e.dy === dy && e.dz === dz)) continue;
		out.push({ dx, dy, dz, orientation });
	}
	return out;
}
