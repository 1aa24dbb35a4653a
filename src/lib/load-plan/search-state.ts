/**
 * A partial stow of one container during the search, and the moves on it: pick the next space,
 * list the blocks that may go there, place one.
 *
 * Space choice follows Parreño et al. (2008) section 3.1: the space whose anchor corner is
 * nearest a corner of the container (distances sorted, compared lexicographically; larger volume
 * on ties), where only the floor corners at the front wall count, so the stow grows from the front
 * wall towards the door. The block goes into that corner (left or right wall side).
 */
import type { Block } from './blocks';
import { NO_LOAD, type CoreProblem } from './core-types';
import { placeInSpaces, type MinExtents, type Space } from './spaces';

export interface PlacedBlock {
	block: Block;
	x: number;
	y: number;
	z: number;
	/** The placed block it rests on (-1: floor). */
	p: number;
}

export interface State {
	spaces: Space[];
	avail: Int32Array;
	placed: PlacedBlock[];
	/** Mass resting on each placed block from blocks placed later (mg). */
	load: number[];
	vol: number;
	weight: number;
	/** Smallest extents of the boxes left (changes only when a type runs out). */
	min: MinExtents;
	/** Per axis, the longest run of box extents left that fits a gap (see reach()). */
	reach: Reach;
	/** Types left when `reach` was last computed (it is refreshed lazily, see place()). */
	reachTypes: number;
}

/** fill[g]: the largest sum of extents (of boxes left, any number of each) that is ≤ g mm. */
export interface Reach {
	x: Int32Array;
	y: Int32Array;
	z: Int32Array;
}

function axisReach(problem: CoreProblem, avail: Int32Array, size: number, axis: 0 | 1 | 2) {
	const lengths = new Set<number>();
	problem.types.forEach((t, i) => {
		if (avail[i]! <= 0) return;
		for (const e of t.extents) lengths.add(axis === 0 ? e.dx : axis === 1 ? e.dy : e.dz);
	});
	// Which lengths 0..size are sums of these (each any number of times), as bits: bit g of word
	// g >> 5. For one length l the sums are built word by word upwards, every word from bits l
	// below it; those are final already when l ≥ 32 (one word), so a word takes all its bits at
	// once. Shorter lengths (never in practice: box sides in mm) go bit by bit.
	const words = (size >> 5) + 1;
	const ok = new Uint32Array(words);
	ok[0] = 1;
	const bit = (g: number) => (ok[g >> 5]! >>> (g & 31)) & 1;
	for (const l of lengths) {
		if (l <= 0 || l > size) continue;
		if (l < 32) {
			for (let g = l; g <= size; g++) if (bit(g - l)) ok[g >> 5]! |= 1 << (g & 31);
			continue;
		}
		const q = l >> 5;
		const r = l & 31;
		for (let w = q; w < words; w++) {
			// Bits w·32 − l … w·32 − l + 31: the top of word w − q − 1 and the bottom of word w − q.
			const lo = ok[w - q]! << r;
			const hi = r === 0 || w - q - 1 < 0 ? 0 : ok[w - q - 1]! >>> (32 - r);
			ok[w] = ok[w]! | lo | hi;
		}
	}
	// The largest reachable length ≤ g, for every g; a word with no bits set repeats the last.
	const fill = new Int32Array(size + 1);
	let last = 0;
	for (let w = 0; w < words; w++) {
		const v = ok[w]!;
		const base = w << 5;
		const end = Math.min(base + 32, size + 1);
		if (v === 0) {
			fill.fill(last, base, end);
			continue;
		}
		for (let g = base; g < end; g++) {
			if ((v >>> (g - base)) & 1) last = g;
			fill[g] = last;
		}
	}
	return fill;
}

/** Gap-filling tables for the boxes left. */
export function reach(problem: CoreProblem, avail: Int32Array): Reach {
	const c = problem.container;
	return {
		x: axisReach(problem, avail, c.L, 0),
		y: axisReach(problem, avail, c.W, 1),
		z: axisReach(problem, avail, c.H, 2)
	};
}

/** Refresh the gap tables once the types left fall to this share of those they were built for. */
const REACH_REFRESH = 0.9;
const REACH_CACHE_MAX = 4_096;
const reachCache = new WeakMap<CoreProblem, Map<string, Reach>>();

function typesLeft(avail: Int32Array): number {
	let n = 0;
	for (let i = 0; i < avail.length; i++) if (avail[i]! > 0) n++;
	return n;
}

/** reach() memoised per problem: it depends only on which types are left, shared by many states. */
function leftReach(problem: CoreProblem, avail: Int32Array): Reach {
	let cache = reachCache.get(problem);
	if (cache === undefined) reachCache.set(problem, (cache = new Map()));
	let key = '';
	for (let i = 0; i < avail.length; i++) if (avail[i]! <= 0) key += `${i},`;
	let hit = cache.get(key);
	if (hit === undefined) {
		if (cache.size >= REACH_CACHE_MAX) cache.clear();
		hit = reach(problem, avail);
		cache.set(key, hit);
	}
	return hit;
}

export function rootState(problem: CoreProblem): State {
	const { L, W, H } = problem.container;
	const avail = Int32Array.from(problem.types.map((t) => t.count));
	return {
		spaces: [{ x1: 0, y1: 0, z1: 0, x2: L, y2: W, z2: H, p: -1 }],
		avail,
		placed: [],
		load: [],
		vol: 0,
		weight: 0,
		min: minExtents(problem, avail),
		reach: reach(problem, avail),
		reachTypes: typesLeft(avail)
	};
}

export function cloneState(s: State): State {
	return {
		spaces: s.spaces,
		avail: s.avail.slice(),
		placed: s.placed.slice(),
		load: s.load.slice(),
		vol: s.vol,
		weight: s.weight,
		min: s.min,
		reach: s.reach,
		reachTypes: s.reachTypes
	};
}

/** Sort key of a space (smaller first): Parreño's sorted corner distances, packed in one number. */
function spaceKey(s: Space, W: number): number {
	let a = s.x1;
	let b = Math.min(s.y1, W - s.y2);
	let c = s.z1;
	if (a > b) [a, b] = [b, a];
	if (b > c) [b, c] = [c, b];
	if (a > b) [a, b] = [b, a];
	return (a * 131072 + b) * 131072 + c;
}

/** Index of the next space to fill, or -1 when none is left. */
export function selectSpace(state: State, W: number): number {
	let best = -1;
	let bestKey = Infinity;
	let bestVol = -1;
	const spaces = state.spaces;
	for (let i = 0; i < spaces.length; i++) {
		const s = spaces[i]!;
		const k = spaceKey(s, W);
		if (k > bestKey) continue;
		const v = (s.x2 - s.x1) * (s.y2 - s.y1) * (s.z2 - s.z1);
		if (k < bestKey || v > bestVol) {
			best = i;
			bestKey = k;
			bestVol = v;
		}
	}
	return best;
}

/** Whether `b` fits space `s` of `state`: size, boxes left, payload, load on what it rests on. */
export function fits(state: State, s: Space, b: Block, payload: number): boolean {
	if (b.dx > s.x2 - s.x1 || b.dy > s.y2 - s.y1 || b.dz > s.z2 - s.z1) return false;
	if (state.weight + b.weight > payload) return false;
	const avail = state.avail;
	for (let i = 0; i < b.types.length; i++) if (avail[b.types[i]!]! < b.nums[i]!) return false;
	for (let p = s.p; p >= 0; p = state.placed[p]!.p) {
		if (state.placed[p]!.block.cap - state.load[p]! < b.weight) return false;
	}
	return true;
}

/** Smallest extents of the boxes still available, per axis. */
export function minExtents(problem: CoreProblem, avail: Int32Array): MinExtents {
	let x = Infinity;
	let y = Infinity;
	let z = Infinity;
	problem.types.forEach((t, i) => {
		if (avail[i]! <= 0) return;
		for (const e of t.extents) {
			if (e.dx < x) x = e.dx;
			if (e.dy < y) y = e.dy;
			if (e.dz < z) z = e.dz;
		}
	});
	return { x, y, z };
}

/** Places `b` in space index `si` of `state` (mutates `state`; `fits` must hold). */
export function place(problem: CoreProblem, state: State, si: number, b: Block): void {
	const s = state.spaces[si]!;
	const W = problem.container.W;
	const x = s.x1;
	const y = s.y1 <= W - s.y2 ? s.y1 : s.y2 - b.dy;
	const z = s.z1;
	const index = state.placed.length;
	state.placed.push({ block: b, x, y, z, p: s.p });
	state.load.push(0);
	for (let p = s.p; p >= 0; p = state.placed[p]!.p) state.load[p]! += b.weight;
	let emptied = false;
	for (let i = 0; i < b.types.length; i++) {
		const t = b.types[i]!;
		state.avail[t]! -= b.nums[i]!;
		if (state.avail[t] === 0) emptied = true;
	}
	state.vol += b.vol;
	state.weight += b.weight;
	const top: Space | null =
		b.cap === NO_LOAD || z + b.dz >= s.z2
			? null
			: { x1: x, y1: y, z1: z + b.dz, x2: x + b.ax, y2: y + b.ay, z2: s.z2, p: index };
	if (emptied) {
		state.min = minExtents(problem, state.avail);
		// With many types the gap tables would be rebuilt at almost every block; a table that
		// still counts a few used-up types is only slightly optimistic, so it is refreshed once a
		// tenth of its types are gone.
		const left = typesLeft(state.avail);
		if (left <= state.reachTypes * REACH_REFRESH) {
			state.reach = leftReach(problem, state.avail);
			state.reachTypes = left;
		}
	}
	state.spaces = placeInSpaces(state.spaces, x, y, z, x + b.dx, y + b.dy, z + b.dz, top, state.min);
}

/** Drops space `si` (nothing fits there). */
export function dropSpace(state: State, si: number): void {
	state.spaces = state.spaces.slice(0, si).concat(state.spaces.slice(si + 1));
}
