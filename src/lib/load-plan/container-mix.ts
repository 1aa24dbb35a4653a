/**
 * Which container types, and how many: one candidate sequence per container type, filling
 * containers of that type one after another (the single-container search on the pieces left);
 * when a container takes everything that is left, a smaller ('fewest') or cheaper ('cheapest')
 * type that also takes it all replaces it. The best sequence wins:
 * 1. most pieces placed;
 * 2. 'fewest': fewest containers, then smaller total internal volume;
 *    'cheapest': lowest total rate, then fewest containers;
 * 3. the earlier candidate type.
 * The work budget is shared evenly between the sequences, and within one between the containers
 * it is still expected to need; work one of them leaves unspent passes on to the next.
 *
 * Sequences often ask for the same fill twice (a 40 ft taking everything, then the 20 ft tried in
 * its place, is the 20 ft sequence's first fill). A fill that completed with work to spare is
 * replayed from memory: the search is deterministic, so a rerun with at least as much work would
 * take the same steps and report the same work.
 */
import Decimal from 'decimal.js';
import { BLOCK_WORK_SHARE, canTake, fillContainer, type FillResult } from './fill-container';
import type { PreparedContainer, PreparedItem } from './prepare';
import { worse, type StopReason } from './work-budget';

export interface MixOptions {
	/** Rates per container index for 'cheapest'; null for 'fewest'. */
	rates: Decimal[] | null;
	maxContainers: number;
	/** Work units for the whole choice (see work-budget.ts). */
	work: number;
	/** Safety stop, performance.now() time. */
	deadline: number;
	seed: number;
	/** Called after each sequence with the best one so far. */
	onSequence?: (best: Sequence) => void;
}

export interface Sequence {
	fills: { type: number; fill: FillResult }[];
	/** Pieces left per item index. */
	remaining: number[];
	placed: number;
	stoppedBy: StopReason;
	/** Work units spent. */
	work: number;
}

function volumeLeft(items: readonly PreparedItem[], remaining: readonly number[]): number {
	return items.reduce((v, it, i) => v + it.volume * remaining[i]!, 0);
}

function takesAll(fill: FillResult, remaining: readonly number[]): boolean {
	return fill.placed.every((p, i) => p === remaining[i]);
}

/** Types to try instead of `primary` for the last container, best first. */
function alternatives(primary: number, containers: readonly PreparedContainer[], o: MixOptions) {
	const better = (u: number): boolean => {
		const cu = containers[u]!;
		const cp = containers[primary]!;
		if (o.rates === null) return cu.volume < cp.volume;
		const c = o.rates[u]!.comparedTo(o.rates[primary]!);
		return c < 0 || (c === 0 && cu.volume < cp.volume);
	};
	return containers
		.map((_, u) => u)
		.filter((u) => u !== primary && better(u))
		.sort((a, b) =>
			o.rates === null
				? containers[a]!.volume - containers[b]!.volume
				: o.rates[a]!.comparedTo(o.rates[b]!) || containers[a]!.volume - containers[b]!.volume
		);
}

/** Fills already searched in this choice, by container type and pieces left. */
type FillMemory = Map<string, FillResult>;

/**
 * fillContainer(), or the remembered fill of the same container and pieces when that one
 * completed on less work than block generation alone may take of `work` (BLOCK_WORK_SHARE, the
 * tighter of the search's two work limits), so no limit could have changed its steps.
 */
function fillOnce(
	memory: FillMemory,
	items: readonly PreparedItem[],
	remaining: readonly number[],
	type: number,
	containers: readonly PreparedContainer[],
	work: number,
	o: MixOptions
): FillResult {
	const key = `${type}|${remaining.join(',')}`;
	const known = memory.get(key);
	if (known && known.stoppedBy === 'complete' && known.work < work * BLOCK_WORK_SHARE) return known;
	const fill = fillContainer(items, remaining, containers[type]!, work, o.deadline, o.seed);
	memory.set(key, fill);
	return fill;
}

function sequence(
	primary: number,
	items: readonly PreparedItem[],
	containers: readonly PreparedContainer[],
	start: readonly number[],
	o: MixOptions,
	budget: number,
	memory: FillMemory
): Sequence {
	const remaining = start.slice();
	const fills: Sequence['fills'] = [];
	let stoppedBy: StopReason = 'complete';
	let used = 0;
	const run = (type: number, slice: number): FillResult => {
		const f = fillOnce(memory, items, remaining, type, containers, slice, o);
		used += f.work;
		stoppedBy = worse(stoppedBy, f.stoppedBy);
		return f;
	};
	const c = containers[primary]!;
	const alts = alternatives(primary, containers, o);
	while (remaining.some((r) => r > 0) && fills.length < o.maxContainers) {
		if (!items.some((it, i) => remaining[i]! > 0 && canTake(it, c))) break;
		const expected = Math.min(
			o.maxContainers - fills.length,
			Math.ceil(volumeLeft(items, remaining) / (c.volume * 0.85))
		);
		const parts = Math.max(1, expected) + (alts.length > 0 ? 1 : 0);
		const slice = Math.max(0, budget - used) / parts;
		let fill = run(primary, slice);
		let type = primary;
		if (fill.boxes.length === 0) break;
		if (takesAll(fill, remaining)) {
			for (const u of alts) {
				const alt = run(u, slice);
				if (takesAll(alt, remaining)) {
					fill = alt;
					type = u;
					break;
				}
			}
		}
		fill.placed.forEach((p, i) => (remaining[i]! -= p));
		fills.push({ type, fill });
	}
	const placed = fills.reduce((n, f) => n + f.fill.boxes.length, 0);
	return { fills, remaining, placed, stoppedBy, work: used };
}

function better(
	s: Sequence,
	t: Sequence,
	containers: readonly PreparedContainer[],
	rates: Decimal[] | null
): boolean {
	if (s.placed !== t.placed) return s.placed > t.placed;
	const volume = (q: Sequence) => q.fills.reduce((v, f) => v + containers[f.type]!.volume, 0);
	if (rates !== null) {
		const cost = (q: Sequence) =>
			q.fills.reduce((sum, f) => sum.plus(rates[f.type]!), new Decimal(0));
		const c = cost(s).comparedTo(cost(t));
		if (c !== 0) return c < 0;
	}
	if (s.fills.length !== t.fills.length) return s.fills.length < t.fills.length;
	return rates === null && volume(s) < volume(t);
}

export function chooseMix(
	items: readonly PreparedItem[],
	containers: readonly PreparedContainer[],
	remaining: readonly number[],
	o: MixOptions
): Sequence {
	let best: Sequence | null = null;
	let stoppedBy: StopReason = 'complete';
	let used = 0;
	const memory: FillMemory = new Map();
	for (let t = 0; t < containers.length; t++) {
		const share = Math.max(0, o.work - used) / (containers.length - t);
		const s = sequence(t, items, containers, remaining, o, share, memory);
		used += s.work;
		stoppedBy = worse(stoppedBy, s.stoppedBy);
		if (best === null || better(s, best, containers, o.rates)) best = s;
		o.onSequence?.(best);
	}
	return { ...best!, stoppedBy, work: used };
}
