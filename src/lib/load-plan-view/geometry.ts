/**
 * Boxes in a container's frame, turned for a viewpoint, and which of their faces can be seen at
 * all: a face flush against a neighbour that covers it whole is never drawn, so a packed block of
 * n × n × n cartons costs about 3n² faces rather than 3n³.
 *
 * Axes as in the planner: x from the front wall to the door, y across from the left wall, z up.
 */
export interface Box {
	x: number;
	y: number;
	z: number;
	dx: number;
	dy: number;
	dz: number;
}

export interface Size {
	lengthMm: number;
	widthMm: number;
	heightMm: number;
}

/** Quarter turns of the container about its vertical axis, anticlockwise seen from above. */
export type Turn = 0 | 1 | 2 | 3;

/** The box in the frame of the container turned `turn` quarter turns (origin kept at a corner). */
export function turnBox(b: Box, size: Size, turn: Turn): Box {
	const L = size.lengthMm;
	const W = size.widthMm;
	switch (turn) {
		case 0:
			return { ...b };
		case 1:
			return { x: W - b.y - b.dy, y: b.x, z: b.z, dx: b.dy, dy: b.dx, dz: b.dz };
		case 2:
			return { x: L - b.x - b.dx, y: W - b.y - b.dy, z: b.z, dx: b.dx, dy: b.dy, dz: b.dz };
		case 3:
			return { x: b.y, y: L - b.x - b.dx, z: b.z, dx: b.dy, dy: b.dx, dz: b.dz };
	}
}

export function turnSize(size: Size, turn: Turn): Size {
	return turn % 2 === 0
		? size
		: { lengthMm: size.widthMm, widthMm: size.lengthMm, heightMm: size.heightMm };
}

/** The faces looking towards +x, +y, +z, -y (the four any of our views can show). */
export type Face = 'px' | 'py' | 'pz' | 'ny';

/** Does the set of boxes on the plane cover the rectangle [a0,a1] × [b0,b1] whole? */
function covered(
	rects: { a0: number; a1: number; b0: number; b1: number }[],
	a0: number,
	a1: number,
	b0: number,
	b1: number
): boolean {
	// One neighbour covering the face whole is the common case in a packed load; several
	// neighbours sharing the cover is rare and simply leaves the face drawn.
	return rects.some((r) => r.a0 <= a0 && r.a1 >= a1 && r.b0 <= b0 && r.b1 >= b1);
}

/**
 * For each box, whether each face can be seen: false only when another box lies flush against it
 * and covers it whole. Boxes must not overlap (the planner's plans never do).
 */
export function visibleFaces(boxes: readonly Box[]): Record<Face, boolean>[] {
	// Boxes by the plane their low side lies on, per axis.
	const byX = new Map<number, { a0: number; a1: number; b0: number; b1: number }[]>();
	const byY = new Map<number, { a0: number; a1: number; b0: number; b1: number }[]>();
	const byYEnd = new Map<number, { a0: number; a1: number; b0: number; b1: number }[]>();
	const byZ = new Map<number, { a0: number; a1: number; b0: number; b1: number }[]>();
	const push = (
		m: typeof byX,
		k: number,
		r: { a0: number; a1: number; b0: number; b1: number }
	) => {
		const list = m.get(k);
		if (list) list.push(r);
		else m.set(k, [r]);
	};
	for (const b of boxes) {
		push(byX, b.x, { a0: b.y, a1: b.y + b.dy, b0: b.z, b1: b.z + b.dz });
		push(byY, b.y, { a0: b.x, a1: b.x + b.dx, b0: b.z, b1: b.z + b.dz });
		push(byYEnd, b.y + b.dy, { a0: b.x, a1: b.x + b.dx, b0: b.z, b1: b.z + b.dz });
		push(byZ, b.z, { a0: b.x, a1: b.x + b.dx, b0: b.y, b1: b.y + b.dy });
	}
	return boxes.map((b) => ({
		px: !covered(byX.get(b.x + b.dx) ?? [], b.y, b.y + b.dy, b.z, b.z + b.dz),
		py: !covered(byY.get(b.y + b.dy) ?? [], b.x, b.x + b.dx, b.z, b.z + b.dz),
		pz: !covered(byZ.get(b.z + b.dz) ?? [], b.x, b.x + b.dx, b.y, b.y + b.dy),
		ny: !covered(byYEnd.get(b.y) ?? [], b.x, b.x + b.dx, b.z, b.z + b.dz)
	}));
}
