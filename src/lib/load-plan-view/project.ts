/**
 * A container's load as flat shapes: an isometric picture (four quarter-turn viewpoints), or an
 * orthographic side or top view. The result is plain polygons and lines with their colours, in
 * painter's order (far first), so an SVG component and a PDF writer (pdfkit's polygon and fill)
 * draw the same geometry.
 *
 * Painter's order: by the sum of a box's centre coordinates along the view direction (iso) or
 * by its depth (side, top). For boxes that do not overlap and are alike in size (cartons in
 * layers) this puts every box after those behind it; very unlike neighbours may overlap wrongly
 * by a sliver, a known limit of the method.
 *
 * Pure module: no framework imports.
 */
import { turnBox, turnSize, visibleFaces, type Box, type Size, type Turn } from './geometry';
import { shade } from './palette';

export type View = { kind: 'iso'; turn: Turn } | { kind: 'side' } | { kind: 'top' };

export type Point = [number, number];

export interface Shape {
	kind: 'polygon' | 'line';
	points: Point[];
	/** null: not filled (lines, outlines). */
	fill: string | null;
	stroke: string;
	/** 'edge': an item's outline; 'frame': the container; 'highlight': the item of the step. */
	weight: 'edge' | 'frame' | 'highlight';
	/** Index of the placement it belongs to, for items. */
	item?: number;
}

export interface Label {
	text: string;
	x: number;
	y: number;
	/** Set the text above the point (else below it). */
	above?: boolean;
}

export interface Drawing {
	shapes: Shape[];
	labels: Label[];
	bounds: { minX: number; minY: number; maxX: number; maxY: number };
}

export interface PlacedBox extends Box {
	/** Fill colour of its product. */
	colour: string;
}

const FRAME = '#4a5563';
const NEAR_FRAME = '#a3adb8';
const FLOOR = '#eef1f4';
const COS30 = Math.sqrt(3) / 2;
const SIN30 = 0.5;

function iso(u: number, v: number, z: number): Point {
	return [(u - v) * COS30, (u + v) * SIN30 - z];
}

function boundsOf(points: Point[]): Drawing['bounds'] {
	let minX = Infinity;
	let minY = Infinity;
	let maxX = -Infinity;
	let maxY = -Infinity;
	for (const [x, y] of points) {
		minX = Math.min(minX, x);
		minY = Math.min(minY, y);
		maxX = Math.max(maxX, x);
		maxY = Math.max(maxY, y);
	}
	return { minX, minY, maxX, maxY };
}

function line(a: Point, b: Point, stroke = FRAME): Shape {
	return { kind: 'line', points: [a, b], fill: null, stroke, weight: 'frame' };
}

function itemShape(points: Point[], fill: string, item: number, highlight: boolean): Shape {
	return {
		kind: 'polygon',
		points,
		fill,
		stroke: highlight ? '#111827' : shade(fill, 0.55),
		weight: highlight ? 'highlight' : 'edge',
		item
	};
}

function isoDrawing(
	size: Size,
	boxes: readonly PlacedBox[],
	turn: Turn,
	highlight: number | null
): Drawing {
	const s = turnSize(size, turn);
	const [L, W, H] = [s.lengthMm, s.widthMm, s.heightMm];
	const P = (u: number, v: number, z: number) => iso(u, v, z);
	const shapes: Shape[] = [
		{
			kind: 'polygon',
			points: [P(0, 0, 0), P(L, 0, 0), P(L, W, 0), P(0, W, 0)],
			fill: FLOOR,
			stroke: FRAME,
			weight: 'frame'
		},
		line(P(0, 0, 0), P(0, 0, H)),
		line(P(L, 0, 0), P(L, 0, H)),
		line(P(0, W, 0), P(0, W, H)),
		line(P(0, 0, H), P(L, 0, H)),
		line(P(0, 0, H), P(0, W, H))
	];
	const turned = boxes.map((b) => turnBox(b, size, turn));
	const faces = visibleFaces(turned);
	const order = turned
		.map((b, i) => ({ i, depth: b.x + b.y + b.z + (b.dx + b.dy + b.dz) / 2 }))
		.sort((a, b) => a.depth - b.depth || a.i - b.i);
	for (const { i } of order) {
		const b = turned[i]!;
		const f = faces[i]!;
		const colour = boxes[i]!.colour;
		const hi = i === highlight;
		const [x0, y0, z0] = [b.x, b.y, b.z];
		const [x1, y1, z1] = [b.x + b.dx, b.y + b.dy, b.z + b.dz];
		if (f.px || hi) {
			shapes.push(
				itemShape(
					[P(x1, y0, z0), P(x1, y1, z0), P(x1, y1, z1), P(x1, y0, z1)],
					shade(colour, 0.8),
					i,
					hi
				)
			);
		}
		if (f.py || hi) {
			shapes.push(
				itemShape(
					[P(x0, y1, z0), P(x1, y1, z0), P(x1, y1, z1), P(x0, y1, z1)],
					shade(colour, 0.64),
					i,
					hi
				)
			);
		}
		if (f.pz || hi) {
			shapes.push(
				itemShape([P(x0, y0, z1), P(x1, y0, z1), P(x1, y1, z1), P(x0, y1, z1)], colour, i, hi)
			);
		}
	}
	// The near edges, lighter: they pass in front of the cargo.
	shapes.push(
		line(P(L, 0, 0), P(L, W, 0)),
		line(P(0, W, 0), P(L, W, 0)),
		line(P(L, W, 0), P(L, W, H), NEAR_FRAME),
		line(P(L, 0, H), P(L, W, H), NEAR_FRAME),
		line(P(0, W, H), P(L, W, H), NEAR_FRAME)
	);
	// Where the door and the front wall are, wherever the turn put them: above the top edge of
	// each end, clear of the cargo.
	const ends = [
		{ text: 'Door', at: { x: size.lengthMm, y: size.widthMm / 2 } },
		{ text: 'Front wall', at: { x: 0, y: size.widthMm / 2 } }
	];
	const labels = ends.map(({ text, at }) => {
		const t = turnBox({ x: at.x, y: at.y, z: 0, dx: 0, dy: 0, dz: 0 }, size, turn);
		const [x, y] = P(t.x, t.y, H);
		return { text, x, y, above: true };
	});
	const corners = [0, L].flatMap((u) => [0, W].flatMap((v) => [0, H].map((z) => P(u, v, z))));
	return { shapes, labels, bounds: boundsOf(corners) };
}

function flatDrawing(
	size: Size,
	boxes: readonly PlacedBox[],
	kind: 'side' | 'top',
	highlight: number | null
): Drawing {
	const L = size.lengthMm;
	const across = kind === 'side' ? size.heightMm : size.widthMm;
	const frame: Point[] = [
		[0, 0],
		[L, 0],
		[L, across],
		[0, across]
	];
	const shapes: Shape[] = [
		{ kind: 'polygon', points: frame, fill: FLOOR, stroke: FRAME, weight: 'frame' }
	];
	const faces = visibleFaces(boxes);
	// Side: seen from the left wall (y = 0), far boxes (large y) first. Top: low boxes first.
	const depth = (b: Box) => (kind === 'side' ? -(b.y + b.dy / 2) : b.z + b.dz / 2);
	const order = boxes.map((b, i) => ({ i, d: depth(b) })).sort((a, b) => a.d - b.d || a.i - b.i);
	for (const { i } of order) {
		const b = boxes[i]!;
		const hi = i === highlight;
		if (!(kind === 'side' ? faces[i]!.ny : faces[i]!.pz) && !hi) continue;
		const [a0, a1] = [b.x, b.x + b.dx];
		// Screen y grows downwards: height (side) or the left wall (top) at the bottom.
		const [c0, c1] =
			kind === 'side' ? [across - b.z - b.dz, across - b.z] : [across - b.y - b.dy, across - b.y];
		const fill = kind === 'side' ? shade(b.colour, 0.8) : b.colour;
		shapes.push(
			itemShape(
				[
					[a0, c0],
					[a1, c0],
					[a1, c1],
					[a0, c1]
				],
				fill,
				i,
				hi
			)
		);
	}
	const labels = [
		{ text: 'Front wall', x: 0, y: across },
		{ text: 'Door', x: L, y: across }
	];
	return { shapes, labels, bounds: boundsOf(frame) };
}

/**
 * The drawing of one container of internal `size` holding `boxes` (placements in loading order),
 * seen as `view`. `highlight`: index of a box to outline (the last one placed in a step view).
 */
export function drawContainer(
	size: Size,
	boxes: readonly PlacedBox[],
	view: View,
	highlight: number | null = null
): Drawing {
	return view.kind === 'iso'
		? isoDrawing(size, boxes, view.turn, highlight)
		: flatDrawing(size, boxes, view.kind, highlight);
}

/**
 * Consecutive filled shapes with the same fill and outline as one SVG path each (painter's order
 * kept), so a plan of thousands of cartons is a few hundred elements, not tens of thousands.
 */
export function pathRuns(
	shapes: readonly Shape[]
): { d: string; fill: string | null; stroke: string; weight: Shape['weight'] }[] {
	const runs: { d: string; fill: string | null; stroke: string; weight: Shape['weight'] }[] = [];
	const round = (n: number) => Math.round(n * 10) / 10;
	for (const s of shapes) {
		const d =
			s.points.map(([x, y], k) => `${k === 0 ? 'M' : 'L'}${round(x)} ${round(y)}`).join('') +
			(s.kind === 'polygon' ? 'Z' : '');
		const last = runs.at(-1);
		if (last && last.fill === s.fill && last.stroke === s.stroke && last.weight === s.weight) {
			last.d += d;
		} else runs.push({ d, fill: s.fill, stroke: s.stroke, weight: s.weight });
	}
	return runs;
}
