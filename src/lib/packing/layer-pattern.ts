/**
 * One layer of identical cartons on a pallet: how many fit, and where.
 *
 * The search covers guillotine patterns: the pallet is cut straight across into two parts, each
 * part again, and so on, every final part holding one block of cartons all turned the same way.
 * That includes both plain block orientations and every two-block pattern. Cut positions are
 * restricted to the sums of the carton's two sides (a cut anywhere else can slide back to such a
 * sum without losing a carton), which keeps the search small. When the cartons are so small that
 * even this search would be slow, it falls back to the best block or two-block pattern.
 *
 * Patterns that are not guillotine (the "pinwheel" kind) can sometimes hold one or two cartons
 * more; `areaBound` is reported so the gap is visible. No overhang: cartons stay within the
 * pallet footprint.
 *
 * Pure module: no framework imports.
 */

export interface LayerBlock {
	/** Corner of the block, mm from the pallet corner along the pallet length. */
	xMm: number;
	/** Corner of the block, mm from the pallet corner along the pallet width. */
	yMm: number;
	/** false: the footprint's first side runs along the pallet length; true: turned 90°. */
	turned: boolean;
	/** The carton side lying along the pallet length, mm. */
	cartonAlongLengthMm: number;
	/** The carton side lying along the pallet width, mm. */
	cartonAlongWidthMm: number;
	/** Cartons one after another along the pallet length. */
	columns: number;
	/** Cartons side by side along the pallet width. */
	rows: number;
	count: number;
}

export type LayerMethod = 'guillotine' | 'two_block';

export interface LayerPattern {
	palletLengthMm: number;
	palletWidthMm: number;
	/** The footprint as given: first side, second side (mm). */
	footprintMm: [number, number];
	/** Cartons per layer. */
	count: number;
	blocks: LayerBlock[];
	/** floor(pallet area ÷ carton footprint area): no pattern can beat it. */
	areaBound: number;
	/** All cartons one way: first side along the pallet length, and turned. */
	blockCounts: { lengthwise: number; turned: number };
	method: LayerMethod;
}

/** Upper limit on the guillotine search's work (roughly, inner-loop steps). */
export const LAYER_SEARCH_BUDGET = 4_000_000;

function blockCount(x: number, y: number, alongX: number, alongY: number): number {
	return Math.floor(x / alongX) * Math.floor(y / alongY);
}

/** Sums i·a + j·b ≤ limit (ascending, starting with 0), and for each t ≤ limit the index of the largest such sum ≤ t. */
function normalPoints(
	limit: number,
	a: number,
	b: number
): { points: number[]; floor: Int32Array } {
	const reach = new Uint8Array(limit + 1);
	reach[0] = 1;
	for (let s = 1; s <= limit; s++) {
		if ((s >= a && reach[s - a] === 1) || (s >= b && reach[s - b] === 1)) reach[s] = 1;
	}
	const points: number[] = [];
	const floor = new Int32Array(limit + 1);
	for (let s = 0; s <= limit; s++) {
		if (reach[s] === 1) points.push(s);
		floor[s] = points.length - 1;
	}
	return { points, floor };
}

interface Region {
	x: number;
	y: number;
	lengthMm: number;
	widthMm: number;
}

function block(region: Region, a: number, b: number, turned: boolean): LayerBlock | null {
	const alongX = turned ? b : a;
	const alongY = turned ? a : b;
	const columns = Math.floor(region.lengthMm / alongX);
	const rows = Math.floor(region.widthMm / alongY);
	if (columns * rows === 0) return null;
	return {
		xMm: region.x,
		yMm: region.y,
		turned,
		cartonAlongLengthMm: alongX,
		cartonAlongWidthMm: alongY,
		columns,
		rows,
		count: columns * rows
	};
}

/** Best single block of a region: lengthwise unless turned holds more. */
function bestBlock(region: Region, a: number, b: number): LayerBlock | null {
	const lengthwise = block(region, a, b, false);
	const turned = block(region, a, b, true);
	if (turned !== null && (lengthwise === null || turned.count > lengthwise.count)) return turned;
	return lengthwise;
}

const BLOCK_A = 0;
const BLOCK_B = 1;
const CUT_X = 2;
const CUT_Y = 3;

function guillotine(L: number, W: number, a: number, b: number): LayerBlock[] | null {
	const px = normalPoints(L, a, b);
	const py = normalPoints(W, a, b);
	const nx = px.points.length;
	const ny = py.points.length;
	if (((nx - 1) * (ny - 1) * (nx + ny)) / 2 > LAYER_SEARCH_BUDGET) return null;

	// Most cartons; among equals, fewest blocks (a simpler pattern to load and to draw).
	const footprint = a * b;
	const best = new Int32Array(nx * ny);
	const parts = new Int32Array(nx * ny);
	const kind = new Uint8Array(nx * ny);
	const arg = new Int32Array(nx * ny);
	for (let i = 1; i < nx; i++) {
		const p = px.points[i] ?? 0;
		for (let j = 1; j < ny; j++) {
			const q = py.points[j] ?? 0;
			const at = i * ny + j;
			const bound = Math.floor((p * q) / footprint);
			const countA = blockCount(p, q, a, b);
			const countB = blockCount(p, q, b, a);
			let value = countA;
			let how = BLOCK_A;
			if (countB > value) {
				value = countB;
				how = BLOCK_B;
			}
			let pieces = value > 0 ? 1 : 0;
			let cut = 0;
			const better = (v: number, n: number): boolean => v > value || (v === value && n < pieces);
			// Cut across the length at x = P[k] ≤ p/2; the rest shrinks to the largest sum that fits.
			for (let k = 1; k < i && (value < bound || pieces > 1); k++) {
				const x = px.points[k] ?? 0;
				if (2 * x > p) break;
				const rest = px.floor[p - x] ?? 0;
				const v = (best[k * ny + j] ?? 0) + (best[rest * ny + j] ?? 0);
				const n = (parts[k * ny + j] ?? 0) + (parts[rest * ny + j] ?? 0);
				if (better(v, n)) {
					value = v;
					pieces = n;
					how = CUT_X;
					cut = k;
				}
			}
			for (let k = 1; k < j && (value < bound || pieces > 1); k++) {
				const y = py.points[k] ?? 0;
				if (2 * y > q) break;
				const rest = py.floor[q - y] ?? 0;
				const v = (best[i * ny + k] ?? 0) + (best[i * ny + rest] ?? 0);
				const n = (parts[i * ny + k] ?? 0) + (parts[i * ny + rest] ?? 0);
				if (better(v, n)) {
					value = v;
					pieces = n;
					how = CUT_Y;
					cut = k;
				}
			}
			best[at] = value;
			parts[at] = pieces;
			kind[at] = how;
			arg[at] = cut;
		}
	}

	const blocks: LayerBlock[] = [];
	const stack: { i: number; j: number; x: number; y: number }[] = [
		{ i: px.floor[L] ?? 0, j: py.floor[W] ?? 0, x: 0, y: 0 }
	];
	while (stack.length > 0) {
		const { i, j, x, y } = stack.pop() as { i: number; j: number; x: number; y: number };
		if (i === 0 || j === 0) continue;
		const at = i * ny + j;
		const p = px.points[i] ?? 0;
		const q = py.points[j] ?? 0;
		const how = kind[at];
		const k = arg[at] ?? 0;
		if (how === CUT_X) {
			const cutAt = px.points[k] ?? 0;
			stack.push({ i: px.floor[p - cutAt] ?? 0, j, x: x + cutAt, y });
			stack.push({ i: k, j, x, y });
		} else if (how === CUT_Y) {
			const cutAt = py.points[k] ?? 0;
			stack.push({ i, j: py.floor[q - cutAt] ?? 0, x, y: y + cutAt });
			stack.push({ i, j: k, x, y });
		} else {
			const b1 = block({ x, y, lengthMm: p, widthMm: q }, a, b, how === BLOCK_B);
			if (b1 !== null) blocks.push(b1);
		}
	}
	return blocks;
}

/** Best of the two block orientations and every two-block split (one straight cut). */
function twoBlock(L: number, W: number, a: number, b: number): LayerBlock[] {
	const whole: Region = { x: 0, y: 0, lengthMm: L, widthMm: W };
	const single = bestBlock(whole, a, b);
	let bestBlocks: LayerBlock[] = single === null ? [] : [single];
	let bestCount = single?.count ?? 0;
	const consider = (first: LayerBlock | null, second: LayerBlock | null): void => {
		const count = (first?.count ?? 0) + (second?.count ?? 0);
		if (count > bestCount) {
			bestCount = count;
			bestBlocks = [first, second].filter((x): x is LayerBlock => x !== null);
		}
	};
	for (const turned of [false, true]) {
		const alongX = turned ? b : a;
		const alongY = turned ? a : b;
		for (let n = 1; n * alongX < L; n++) {
			const x = n * alongX;
			consider(
				block({ x: 0, y: 0, lengthMm: x, widthMm: W }, a, b, turned),
				bestBlock({ x, y: 0, lengthMm: L - x, widthMm: W }, a, b)
			);
		}
		for (let n = 1; n * alongY < W; n++) {
			const y = n * alongY;
			consider(
				block({ x: 0, y: 0, lengthMm: L, widthMm: y }, a, b, turned),
				bestBlock({ x: 0, y, lengthMm: L, widthMm: W - y }, a, b)
			);
		}
	}
	return bestBlocks;
}

/** Recent results, so repeated cartons (same product on several lines, repeated requests) are free. */
const memo = new Map<string, LayerPattern>();
const MEMO_SIZE = 500;

function copy(pattern: LayerPattern): LayerPattern {
	return {
		...pattern,
		footprintMm: [...pattern.footprintMm],
		blocks: pattern.blocks.map((b) => ({ ...b })),
		blockCounts: { ...pattern.blockCounts }
	};
}

/**
 * The best layer found for cartons with footprint `firstMm` × `secondMm` on a pallet
 * `palletLengthMm` × `palletWidthMm` (all whole millimetres, > 0). Count 0 when the footprint
 * fits in neither orientation.
 */
export function layerPattern(
	palletLengthMm: number,
	palletWidthMm: number,
	firstMm: number,
	secondMm: number
): LayerPattern {
	for (const [name, value] of Object.entries({
		palletLengthMm,
		palletWidthMm,
		firstMm,
		secondMm
	})) {
		if (!Number.isSafeInteger(value) || value <= 0 || value > 1_000_000) {
			throw new RangeError(`${name} must be a whole number of millimetres from 1 to 1000000`);
		}
	}
	const key = `${palletLengthMm}×${palletWidthMm}:${firstMm}×${secondMm}`;
	const known = memo.get(key);
	if (known !== undefined) return copy(known);
	const pattern = search(palletLengthMm, palletWidthMm, firstMm, secondMm);
	if (memo.size >= MEMO_SIZE) {
		const oldest = memo.keys().next();
		if (oldest.done !== true) memo.delete(oldest.value);
	}
	memo.set(key, pattern);
	return copy(pattern);
}

function search(L: number, W: number, a: number, b: number): LayerPattern {
	let method: LayerMethod = 'guillotine';
	let blocks = guillotine(L, W, a, b);
	if (blocks === null) {
		method = 'two_block';
		blocks = twoBlock(L, W, a, b);
	}
	blocks.sort((m, n) => m.yMm - n.yMm || m.xMm - n.xMm);
	return {
		palletLengthMm: L,
		palletWidthMm: W,
		footprintMm: [a, b],
		count: blocks.reduce((sum, bl) => sum + bl.count, 0),
		blocks,
		areaBound: Math.floor((L * W) / (a * b)),
		blockCounts: { lengthwise: blockCount(L, W, a, b), turned: blockCount(L, W, b, a) },
		method
	};
}

/** Every carton's rectangle in a pattern (for drawing it, and for checking it). */
export function layerRectangles(
	pattern: LayerPattern
): { xMm: number; yMm: number; lengthMm: number; widthMm: number }[] {
	const out: { xMm: number; yMm: number; lengthMm: number; widthMm: number }[] = [];
	for (const bl of pattern.blocks) {
		for (let c = 0; c < bl.columns; c++) {
			for (let r = 0; r < bl.rows; r++) {
				out.push({
					xMm: bl.xMm + c * bl.cartonAlongLengthMm,
					yMm: bl.yMm + r * bl.cartonAlongWidthMm,
					lengthMm: bl.cartonAlongLengthMm,
					widthMm: bl.cartonAlongWidthMm
				});
			}
		}
	}
	return out;
}
