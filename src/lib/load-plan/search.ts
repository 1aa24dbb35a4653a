/**
 * Beam search over block placements for one container, after Araya & Riff (2014), "A beam search
 * approach to the container loading problem", Computers & Operations Research 43 (BSG): each
 * child of a beam node is scored by the volume of a greedy completion from it; the best `width`
 * children form the next level; the whole search is repeated with the width doubled until the
 * work budget is spent (an anytime scheme; see work-budget.ts). The greedy and the beam's children take the blocks
 * with the best fitness (see fitness()) in the chosen space. Our own implementation.
 *
 * Speed: block sizes sit in typed arrays for the first scan, and because fitness never exceeds a
 * block's volume and the blocks are sorted by volume, a scan stops once no later block can enter
 * the top k. Space objects are immutable, so a state copies only arrays of references.
 */
import type { Block } from './blocks';
import type { CoreProblem } from './core-types';
import {
	cloneState,
	dropSpace,
	fits,
	place,
	rootState,
	selectSpace,
	type State
} from './search-state';
import { exhausted, type WorkMeter } from './work-budget';

export interface SearchLimits {
	/** Work (and safety time) after which the best stow so far is returned. */
	meter: WorkMeter;
	/** Widths 1, 2, 4… up to this; the schedule then counts as complete. */
	maxWidth: number;
	/** Children per beam node. */
	children: number;
	/** Orders children of equal value (any integer; the same seed, the same order). */
	seed: number;
}

/** A well-mixed 32-bit hash of (n, seed), for tie-breaks. */
function tieKey(n: number, seed: number): number {
	let h = Math.imul(n ^ 0x9e3779b9, 0x85ebca6b) ^ Math.imul(seed, 0xc2b2ae35);
	h ^= h >>> 16;
	h = Math.imul(h, 0x7feb352d);
	return (h ^ (h >>> 15)) >>> 0;
}

export interface SearchResult {
	state: State;
	stoppedBy: 'complete' | 'work' | 'time';
	/** Greedy completions run (a measure of effort). */
	greedyRuns: number;
}

/** The blocks with their sizes in typed arrays, for a tight first scan. */
export interface BlockTable {
	list: readonly Block[];
	dx: Int32Array;
	dy: Int32Array;
	dz: Int32Array;
	vol: Float64Array;
}

export function blockTable(list: readonly Block[]): BlockTable {
	// Plain loops: TypedArray.from with a map function goes through the iterator protocol and
	// cost more than the rest of this fill's bookkeeping.
	const n = list.length;
	const t: BlockTable = {
		list,
		dx: new Int32Array(n),
		dy: new Int32Array(n),
		dz: new Int32Array(n),
		vol: new Float64Array(n)
	};
	for (let i = 0; i < n; i++) {
		const b = list[i]!;
		t.dx[i] = b.dx;
		t.dy[i] = b.dy;
		t.dz[i] = b.dz;
		t.vol[i] = b.vol;
	}
	return t;
}

/**
 * Fitness of block `b` in space `s`: its box volume less the volume it makes unusable, after
 * Zhu & Lim (2012), "A new iterative-doubling Greedy-Lookahead algorithm for the single container
 * loading problem", EJOR 222(3), section 4.2 (our reading): along each axis the gap left beside
 * the block that no run of remaining box extents can fill, times the block's cross-section there,
 * plus the block's own empty volume.
 */
function fitness(state: State, sx: number, sy: number, sz: number, b: Block): number {
	const r = state.reach;
	const gx = sx - b.dx;
	const gy = sy - b.dy;
	const gz = sz - b.dz;
	const loss =
		(gx - r.x[gx]!) * b.dy * b.dz +
		(gy - r.y[gy]!) * b.dx * b.dz +
		(gz - r.z[gz]!) * b.dx * b.dy +
		(b.dx * b.dy * b.dz - b.vol);
	return b.vol - loss;
}

/** Up to `k` blocks that fit space `si`, best fitness first (ties: earlier in the list). */
function fittingBlocks(
	problem: CoreProblem,
	state: State,
	si: number,
	blocks: BlockTable,
	k: number,
	m: WorkMeter
): Block[] {
	const s = state.spaces[si]!;
	const sx = s.x2 - s.x1;
	const sy = s.y2 - s.y1;
	const sz = s.z2 - s.z1;
	const { dx, dy, dz, vol, list } = blocks;
	const n = list.length;
	const payload = problem.container.payload;
	const top: Block[] = [];
	const score: number[] = [];
	let i = 0;
	for (; i < n; i++) {
		// Fitness never exceeds volume and the list is by volume: nothing later can enter the top.
		if (top.length === k && vol[i]! <= score[k - 1]!) break;
		if (dx[i]! > sx || dy[i]! > sy || dz[i]! > sz) continue;
		const b = list[i]!;
		const f = fitness(state, sx, sy, sz, b);
		if (top.length === k && f <= score[k - 1]!) continue;
		if (!fits(state, s, b, payload)) continue;
		let j = top.length < k ? top.length : k - 1;
		while (j > 0 && score[j - 1]! < f) {
			top[j] = top[j - 1]!;
			score[j] = score[j - 1]!;
			j--;
		}
		top[j] = b;
		score[j] = f;
	}
	m.used += i + 1;
	return top;
}

/** Fills `state` greedily to the end (mutates it). */
function greedy(problem: CoreProblem, state: State, blocks: BlockTable, m: WorkMeter): State {
	const W = problem.container.W;
	for (;;) {
		const si = selectSpace(state, W);
		if (si < 0) return state;
		const found = fittingBlocks(problem, state, si, blocks, 1, m);
		if (found.length === 0) dropSpace(state, si);
		else placeCounted(problem, state, si, found[0]!, m);
	}
}

/** place(), charging the space update to the meter. */
function placeCounted(problem: CoreProblem, state: State, si: number, b: Block, m: WorkMeter) {
	m.used += state.spaces.length;
	place(problem, state, si, b);
}

/** The next space that has a fitting block, dropping those without (mutates `state`). */
function expansions(
	problem: CoreProblem,
	state: State,
	blocks: BlockTable,
	k: number,
	m: WorkMeter
): { si: number; list: Block[] } | null {
	for (;;) {
		const si = selectSpace(state, problem.container.W);
		if (si < 0) return null;
		const list = fittingBlocks(problem, state, si, blocks, k, m);
		if (list.length > 0) return { si, list };
		dropSpace(state, si);
	}
}

export function beamSearch(
	problem: CoreProblem,
	blocks: BlockTable,
	limits: SearchLimits
): SearchResult {
	const root = rootState(problem);
	const c = problem.container;
	const total = problem.types.reduce((sum, t) => sum + t.volume * t.count, 0);
	const bound = Math.min(total, c.L * c.W * c.H);
	const m = limits.meter;
	let best = greedy(problem, cloneState(root), blocks, m);
	let runs = 1;
	for (let width = 2; width <= limits.maxWidth; width *= 2) {
		if (best.vol >= bound) break;
		let beam: State[] = [root];
		while (beam.length > 0) {
			const next: { state: State; value: number; order: number }[] = [];
			for (const node of beam) {
				const work = cloneState(node);
				const exp = expansions(problem, work, blocks, limits.children, m);
				if (exp === null) continue;
				for (const b of exp.list) {
					const child = cloneState(work);
					placeCounted(problem, child, exp.si, b, m);
					const done = greedy(problem, cloneState(child), blocks, m);
					runs++;
					if (done.vol > best.vol) best = done;
					next.push({ state: child, value: done.vol, order: tieKey(next.length, limits.seed) });
					const stop = exhausted(m);
					if (stop !== null) return { state: best, stoppedBy: stop, greedyRuns: runs };
				}
			}
			next.sort((p, q) => q.value - p.value || p.order - q.order);
			beam = next.slice(0, width).map((n) => n.state);
		}
	}
	return { state: best, stoppedBy: 'complete', greedyRuns: runs };
}
