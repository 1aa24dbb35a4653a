/**
 * Blocks: cuboids of boxes placed together as one unit, after Fanslau & Bortfeldt (2010), "A tree
 * search algorithm for solving the container loading problem", INFORMS J. Computing 22(2),
 * sections 3.2–3.3 (simple and general blocks, packing area, minimum fill rate). Our own code.
 *
 * - Simple block: nx × ny × nz boxes of one type in one orientation.
 * - General block: two blocks side by side along x or y, or one on the other's packing area along
 *   z, kept only when its boxes fill at least MIN_FILL of its bounding box.
 * - Packing area: the rectangle at the block's origin corner (ax × ay) on its top face that is
 *   wholly covered by box tops at the block's full height; only there may more cargo rest, so
 *   full support holds by construction.
 * - Stacking: `cap` is the mass the block may still take on top, charged in full to every box in
 *   it (a conservative reading: a load anywhere on the block is assumed to bear on each box).
 */
import { NO_LOAD, type CoreBoxType, type CoreContainer } from './core-types';
import type { WorkMeter } from './work-budget';

export const MIN_FILL = 0.98;

export interface Block {
	dx: number;
	dy: number;
	dz: number;
	/** Packing area on top, from the block's origin corner. */
	ax: number;
	ay: number;
	/** Volume of its boxes. */
	vol: number;
	weight: number;
	cap: number;
	boxes: number;
	/** Box counts per type, sparse and sorted by type. */
	types: number[];
	nums: number[];
	/** 0 simple; 1, 2, 3: b after a along x, y, z. */
	kind: 0 | 1 | 2 | 3;
	/** Simple: type, extent index, repetitions. */
	t: number;
	o: number;
	nx: number;
	ny: number;
	nz: number;
	a: Block | null;
	b: Block | null;
	/** Identity for de-duplication and ties (`key()`), set when the block is kept. */
	key: string;
}

export interface BlockLimits {
	maxBlocks: number;
	/** Each pair tried costs one unit; general blocks stop once `meter.used` reaches `maxWork`
	 * (or at the meter's safety deadline). */
	meter: WorkMeter;
	maxWork: number;
}

function key(b: Block): string {
	return `${b.dx},${b.dy},${b.dz},${b.ax},${b.ay}:${b.types.join('.')}:${b.nums.join('.')}`;
}

function simpleBlock(bt: CoreBoxType, t: number, o: number, nx: number, ny: number, nz: number) {
	const e = bt.extents[o]!;
	const n = nx * ny * nz;
	const cap = bt.cap === NO_LOAD ? NO_LOAD : bt.cap - (nz - 1) * bt.weight;
	const block: Block = {
		dx: nx * e.dx,
		dy: ny * e.dy,
		dz: nz * e.dz,
		ax: nx * e.dx,
		ay: ny * e.dy,
		vol: n * bt.volume,
		weight: n * bt.weight,
		cap,
		boxes: n,
		types: [t],
		nums: [n],
		kind: 0,
		t,
		o,
		nx,
		ny,
		nz,
		a: null,
		b: null,
		key: ''
	};
	return block;
}

/** Calls `visit` for every nx × ny × nz block of each type and orientation that fits, in one order. */
function eachSimple(
	types: CoreBoxType[],
	c: CoreContainer,
	visit: (t: number, o: number, nx: number, ny: number, nz: number) => void
): void {
	types.forEach((bt, t) => {
		bt.extents.forEach((e, o) => {
			const maxX = Math.min(Math.floor(c.L / e.dx), bt.count);
			const maxY = Math.min(Math.floor(c.W / e.dy), bt.count);
			let maxZ = Math.min(Math.floor(c.H / e.dz), bt.count);
			if (bt.cap === NO_LOAD) maxZ = Math.min(maxZ, 1);
			else if (bt.cap !== Infinity && bt.weight > 0) {
				maxZ = Math.min(maxZ, Math.floor(bt.cap / bt.weight) + 1);
			}
			for (let nz = 1; nz <= maxZ; nz++) {
				for (let ny = 1; ny <= maxY && ny * nz <= bt.count; ny++) {
					for (let nx = 1; nx <= maxX && nx * ny * nz <= bt.count; nx++) visit(t, o, nx, ny, nz);
				}
			}
		});
	});
}

/**
 * Every simple block that fits; over `maxBlocks`, every single box and then the largest (by box
 * volume, in the order made among equal volumes). A first pass only counts the candidates per type
 * and box count (there are often many times more than are kept), which gives the smallest volume
 * kept; the second makes only the blocks kept.
 */
function simpleBlocks(types: CoreBoxType[], c: CoreContainer, maxBlocks: number): Block[] {
	const perCount = types.map((bt) => new Int32Array(bt.count + 1));
	let total = 0;
	eachSimple(types, c, (t, _o, nx, ny, nz) => {
		perCount[t]![nx * ny * nz]!++;
		total++;
	});
	const make = (t: number, o: number, nx: number, ny: number, nz: number) =>
		simpleBlock(types[t]!, t, o, nx, ny, nz);
	if (total <= maxBlocks) {
		const all: Block[] = [];
		eachSimple(types, c, (t, o, nx, ny, nz) => all.push(make(t, o, nx, ny, nz)));
		return all;
	}
	const singles = perCount.reduce((sum, counts) => sum + counts[1]!, 0);
	const keep = Math.max(0, maxBlocks - singles);
	// Candidates per volume (types may share one), largest first: the threshold is the volume
	// where the running count reaches `keep`; of that volume only the first `quota` are kept.
	const byVolume = new Map<number, number>();
	perCount.forEach((counts, t) => {
		for (let n = 2; n < counts.length; n++) {
			if (counts[n]! === 0) continue;
			const v = n * types[t]!.volume;
			byVolume.set(v, (byVolume.get(v) ?? 0) + counts[n]!);
		}
	});
	const volumes = [...byVolume.keys()].sort((a, b) => b - a);
	let threshold = Infinity;
	let quota = 0;
	let taken = 0;
	for (const v of volumes) {
		if (taken >= keep) break;
		const here = byVolume.get(v)!;
		threshold = v;
		quota = Math.min(here, keep - taken);
		taken += here;
	}
	// Single boxes first, in the order made; then the kept larger blocks, largest volume first.
	const out: Block[] = [];
	const buckets = new Map<number, Block[]>(volumes.map((v) => [v, []]));
	eachSimple(types, c, (t, o, nx, ny, nz) => {
		const n = nx * ny * nz;
		if (n === 1) {
			out.push(make(t, o, nx, ny, nz));
			return;
		}
		const v = n * types[t]!.volume;
		if (v < threshold) return;
		if (v === threshold) {
			if (quota === 0) return;
			quota--;
		}
		buckets.get(v)!.push(make(t, o, nx, ny, nz));
	});
	for (const v of volumes) {
		if (v < threshold) break;
		for (const b of buckets.get(v)!) out.push(b);
	}
	return out;
}

/** Merged sparse counts of a and b, or null when more than `count` of some type. */
function mergeCounts(a: Block, b: Block, types: CoreBoxType[]): [number[], number[]] | null {
	const ts: number[] = [];
	const ns: number[] = [];
	let i = 0;
	let j = 0;
	while (i < a.types.length || j < b.types.length) {
		const ta = i < a.types.length ? a.types[i]! : Infinity;
		const tb = j < b.types.length ? b.types[j]! : Infinity;
		const t = Math.min(ta, tb);
		let n = 0;
		if (ta === t) n += a.nums[i++]!;
		if (tb === t) n += b.nums[j++]!;
		if (n > types[t]!.count) return null;
		ts.push(t);
		ns.push(n);
	}
	return [ts, ns];
}

/** The general block of b placed after a along `kind`, or null when not allowed. */
function combine(
	a: Block,
	b: Block,
	kind: 1 | 2 | 3,
	c: CoreContainer,
	types: CoreBoxType[]
): Block | null {
	let dx: number, dy: number, dz: number, ax: number, ay: number, cap: number;
	if (kind === 3) {
		// b rests on a's packing area.
		if (b.dx > a.ax || b.dy > a.ay || a.cap === NO_LOAD || a.cap < b.weight) return null;
		dx = a.dx;
		dy = a.dy;
		dz = a.dz + b.dz;
		ax = b.ax;
		ay = b.ay;
		cap = b.cap === NO_LOAD ? NO_LOAD : Math.min(b.cap, a.cap - b.weight);
	} else {
		// Side by side; the taller one first so the packing area stays at the origin.
		if (b.dz > a.dz) return null;
		if (kind === 1) {
			dx = a.dx + b.dx;
			dy = Math.max(a.dy, b.dy);
			ax = a.ax;
			ay = a.ay;
			if (b.dz === a.dz && a.ax === a.dx && Math.min(a.ay, b.ay) * (a.dx + b.ax) > ax * ay) {
				ax = a.dx + b.ax;
				ay = Math.min(a.ay, b.ay);
			}
		} else {
			dx = Math.max(a.dx, b.dx);
			dy = a.dy + b.dy;
			ax = a.ax;
			ay = a.ay;
			if (b.dz === a.dz && a.ay === a.dy && Math.min(a.ax, b.ax) * (a.dy + b.ay) > ax * ay) {
				ax = Math.min(a.ax, b.ax);
				ay = a.dy + b.ay;
			}
		}
		dz = a.dz;
		cap = a.cap === NO_LOAD || b.cap === NO_LOAD ? NO_LOAD : Math.min(a.cap, b.cap);
	}
	if (dx > c.L || dy > c.W || dz > c.H) return null;
	const vol = a.vol + b.vol;
	if (vol < MIN_FILL * dx * dy * dz) return null;
	const merged = mergeCounts(a, b, types);
	if (merged === null) return null;
	return {
		dx,
		dy,
		dz,
		ax,
		ay,
		vol,
		weight: a.weight + b.weight,
		cap,
		boxes: a.boxes + b.boxes,
		types: merged[0],
		nums: merged[1],
		kind,
		t: -1,
		o: -1,
		nx: 0,
		ny: 0,
		nz: 0,
		a,
		b,
		key: ''
	};
}

const SIDE = [1, 2] as const;
const STACK = [3] as const;

interface SortedIndex {
	order: number[];
	keys: Float64Array;
}

/** 0..n-1 sorted by `f` (stable). */
function sortedIndices(n: number, f: (i: number) => number): number[] {
	// Whole non-negative keys (mm, mm², mm³) are packed with their index into one number and
	// sorted natively: key first, then index, which is the stable order. Exact while below 2^53.
	const packed = new Float64Array(n);
	let whole = true;
	for (let i = 0; i < n; i++) {
		const k = f(i);
		whole &&= Number.isInteger(k) && k >= 0 && k * n + i < Number.MAX_SAFE_INTEGER;
		packed[i] = k * n + i;
	}
	const order: number[] = new Array(n);
	if (whole) {
		packed.sort();
		for (let i = 0; i < n; i++) order[i] = packed[i]! % n;
	} else {
		for (let i = 0; i < n; i++) order[i] = i;
		order.sort((p, q) => f(p) - f(q));
	}
	return order;
}

/** Indices from..to of `all` sorted by `f` (stable), with the sorted keys. */
function sortedBy(all: readonly Block[], from: number, to: number, f: (b: Block) => number) {
	const order = sortedIndices(to - from, (i) => f(all[from + i]!)).map((i) => from + i);
	const keys = new Float64Array(order.length);
	for (let i = 0; i < order.length; i++) keys[i] = f(all[order[i]!]!);
	return { order, keys };
}

/** Two sorted indices merged, `a`'s (the lower indices) first among equal keys: stable. */
function merged(a: SortedIndex, b: SortedIndex): SortedIndex {
	const n = a.order.length + b.order.length;
	const order: number[] = new Array(n);
	const keys = new Float64Array(n);
	let i = 0;
	let j = 0;
	for (let k = 0; k < n; k++) {
		if (j >= b.order.length || (i < a.order.length && a.keys[i]! <= b.keys[j]!)) {
			order[k] = a.order[i]!;
			keys[k] = a.keys[i++]!;
		} else {
			order[k] = b.order[j]!;
			keys[k] = b.keys[j++]!;
		}
	}
	return { order, keys };
}

function lowerBound(keys: Float64Array, v: number): number {
	let lo = 0;
	let hi = keys.length;
	while (lo < hi) {
		const mid = (lo + hi) >> 1;
		if (keys[mid]! < v) lo = mid + 1;
		else hi = mid;
	}
	return lo;
}

function spent(limits: BlockLimits): boolean {
	return limits.meter.used >= limits.maxWork || performance.now() > limits.meter.deadline;
}

/** Blocks by box volume, largest first; equal volumes keep their order (a stable sort). */
function largestFirst(blocks: readonly Block[]): Block[] {
	let top = 0;
	for (const b of blocks) top = Math.max(top, b.vol);
	return sortedBy(blocks, 0, blocks.length, (b) => top - b.vol).order.map((i) => blocks[i]!);
}

/** Characters of a key that keyHead packs: 16 values (end, ',', '.', digits, ':') per character. */
const HEAD_CHARS = 13;

/**
 * The first HEAD_CHARS characters of a key as one number, in the keys' text order (a key that
 * ends first is smaller, as in text): comparing these decides most ties without comparing text.
 * Keys hold only digits, ',', '.' and ':' (see key()); 16^13 is below 2^53, so this is exact.
 */
function keyHead(key: string): number {
	let h = 0;
	for (let i = 0; i < HEAD_CHARS; i++) h = h * 16 + (i < key.length ? key.charCodeAt(i) - 43 : 0);
	return h;
}

/** Orders blocks: larger box volume first, then fewer boxes, then by key (deterministic). */
function sortBlocks(all: Block[]): Block[] {
	// By volume natively first; only runs of equal volume need the comparator (and the keys).
	const byVol = largestFirst(all);
	const out: Block[] = [];
	for (let i = 0; i < byVol.length;) {
		let j = i + 1;
		while (j < byVol.length && byVol[j]!.vol === byVol[i]!.vol) j++;
		if (j - i === 1) out.push(byVol[i]!);
		else {
			const run = byVol.slice(i, j).map((b) => ({ b, head: keyHead(b.key) }));
			run.sort(
				(p, q) =>
					p.b.boxes - q.b.boxes ||
					p.head - q.head ||
					(p.b.key < q.b.key ? -1 : p.b.key > q.b.key ? 1 : 0)
			);
			for (const r of run) out.push(r.b);
		}
		i = j;
	}
	return out;
}

/**
 * Simple blocks, then general blocks in rounds (each round pairs the blocks of the last round with
 * all so far) until `maxBlocks`, no new block, or the work cap. Sorted by sortBlocks.
 */
export function generateBlocks(
	types: CoreBoxType[],
	c: CoreContainer,
	limits: BlockLimits
): Block[] {
	const seen = new Set<string>();
	const all: Block[] = [];
	const add = (b: Block): boolean => {
		const k = key(b);
		if (seen.has(k)) return false;
		seen.add(k);
		b.key = k;
		all.push(b);
		return true;
	};
	for (const b of simpleBlocks(types, c, limits.maxBlocks)) add(b);
	let from = 0;
	const height = (b: Block) => b.dz;
	const area = (b: Block) => b.dx * b.dy;
	let byHeight: SortedIndex = { order: [], keys: new Float64Array(0) };
	let byArea = byHeight;
	while (all.length < limits.maxBlocks && from < all.length) {
		const to = all.length;
		// Partners are looked up in windows: side by side only with nearly the same height,
		// stacked only with nearly the same footprint (others rarely reach MIN_FILL). Each round
		// sorts only its new blocks and merges them in.
		byHeight = merged(byHeight, sortedBy(all, from, to, height));
		byArea = merged(byArea, sortedBy(all, from, to, area));
		const m = limits.meter;
		const tryPair = (ob: Block, nb: Block, kind: 1 | 2 | 3): boolean => {
			m.used += 2;
			const g1 = combine(ob, nb, kind, c, types);
			if (g1 !== null && add(g1) && all.length >= limits.maxBlocks) return true;
			if (ob === nb) return false;
			const g2 = combine(nb, ob, kind, c, types);
			return g2 !== null && add(g2) && all.length >= limits.maxBlocks;
		};
		outer: for (let j = from; j < to; j++) {
			const nb = all[j]!;
			for (const [index, key, kinds] of [
				[byHeight, nb.dz, SIDE] as const,
				[byArea, nb.dx * nb.dy, STACK] as const
			]) {
				const lo = lowerBound(index.keys, key * MIN_FILL);
				for (let k = lo; k < index.keys.length && index.keys[k]! <= key / MIN_FILL; k++) {
					const i = index.order[k]!;
					if (i >= from && i < j) continue; // this pair was tried in row i
					for (const kind of kinds) if (tryPair(all[i]!, nb, kind)) break outer;
				}
			}
			if (spent(limits)) break;
		}
		if (spent(limits)) break;
		from = to;
	}
	return sortBlocks(all);
}
