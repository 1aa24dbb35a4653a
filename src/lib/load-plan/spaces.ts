/**
 * Empty spaces of a partial stow as maximal cuboids (the "maximal spaces" of Lai & Chan 1997 and
 * Parreño et al. 2008, INFORMS J. Computing 20(3)), kept fully supported for Fanslau & Bortfeldt's
 * packing variant (2010, section 3.4):
 *
 * - every space's floor rectangle rests wholly on the container floor or on one block's packing
 *   area, and `p` names that block (-1: the floor);
 * - when a block cuts a space, the pieces beside and below it keep their floor; the piece above it
 *   is dropped (its floor would be partly in the air); instead one new space is opened on the
 *   block's packing area, up to the top of the space the block was placed in (empty by
 *   construction, so no other cargo can cut into it).
 *
 * Spaces are immutable; each update returns a new array.
 */
export interface Space {
	x1: number;
	y1: number;
	z1: number;
	x2: number;
	y2: number;
	z2: number;
	/** Index of the placed block whose packing area is the floor; -1 for the container floor. */
	p: number;
}

/** Smallest extents along x, y, z of any box still to place: smaller spaces are useless. */
export interface MinExtents {
	x: number;
	y: number;
	z: number;
}

function usable(s: Space, m: MinExtents): boolean {
	return s.x2 - s.x1 >= m.x && s.y2 - s.y1 >= m.y && s.z2 - s.z1 >= m.z;
}

function contains(a: Space, b: Space): boolean {
	return (
		a.x1 <= b.x1 && a.y1 <= b.y1 && a.z1 <= b.z1 && a.x2 >= b.x2 && a.y2 >= b.y2 && a.z2 >= b.z2
	);
}

/**
 * Spaces after a block occupies [x1,x2)×[y1,y2)×[z1,z2), plus the new space on its packing area
 * (`top`, or null when nothing may rest on it). Drops spaces too small for `min` and spaces inside
 * others (a contained space has the same floor height, so nothing is lost).
 */
export function placeInSpaces(
	spaces: readonly Space[],
	x1: number,
	y1: number,
	z1: number,
	x2: number,
	y2: number,
	z2: number,
	top: Space | null,
	min: MinExtents
): Space[] {
	const out: Space[] = [];
	for (const s of spaces) {
		if (s.x2 <= x1 || s.x1 >= x2 || s.y2 <= y1 || s.y1 >= y2 || s.z2 <= z1 || s.z1 >= z2) {
			if (usable(s, min)) out.push(s);
			continue;
		}
		const pieces: Space[] = [];
		if (s.x1 < x1) pieces.push({ ...s, x2: x1 });
		if (s.x2 > x2) pieces.push({ ...s, x1: x2 });
		if (s.y1 < y1) pieces.push({ ...s, y2: y1 });
		if (s.y2 > y2) pieces.push({ ...s, y1: y2 });
		if (s.z1 < z1) pieces.push({ ...s, z2: z1 });
		for (const q of pieces) if (usable(q, min)) out.push(q);
	}
	if (top !== null && usable(top, min)) out.push(top);
	// Remove spaces inside others (the first of two equal ones stays).
	const keep = new Uint8Array(out.length).fill(1);
	for (let i = 0; i < out.length; i++) {
		if (!keep[i]) continue;
		const a = out[i]!;
		for (let j = 0; j < out.length; j++) {
			if (i === j || !keep[j]) continue;
			if (contains(a, out[j]!)) keep[j] = 0;
		}
	}
	const result: Space[] = [];
	for (let i = 0; i < out.length; i++) if (keep[i]) result.push(out[i]!);
	return result;
}
