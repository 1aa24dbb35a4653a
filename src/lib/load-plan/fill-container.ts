/**
 * One container of one type, filled from the pieces still to place: blocks, then the beam search,
 * then the boxes in container coordinates.
 */
import { generateBlocks } from './blocks';
import type { CoreProblem } from './core-types';
import { expandPlaced } from './expand';
import { coreBoxType, type PreparedContainer, type PreparedItem } from './prepare';
import { beamSearch, blockTable } from './search';
import type { OrientedExtent } from './orientations';
import { meter, type StopReason } from './work-budget';

/**
 * Most blocks generated per container. Fanslau & Bortfeldt (2010) use 10,000; with a budget of
 * seconds in JS a shorter list (faster greedy completions, more of them) did better on BR1–BR7.
 */
export const MAX_BLOCKS = 2_000;
/** Widest beam of the schedule; a search that gets there is complete. */
export const MAX_WIDTH = 1024;
/** Largest share of a container's work that block generation may take. */
export const BLOCK_WORK_SHARE = 0.4;
/** Children tried per beam node. */
export const CHILDREN = 8;

/**
 * Blocks for an instance with `types` box types: 1,000 + 50 per type, at most MAX_BLOCKS. Under a
 * fixed work budget a shorter list means cheaper greedy completions and so more of them; with few
 * types the first 1,000 blocks already hold the useful general blocks (BR1, 3 types: 90.9 % with
 * 1,150 blocks against 87.7 % with 2,000 on its first 6 instances), while many types need the
 * longer list (more than 2,000 was worse on BR10 and BR15). The container's volume did not give a
 * better rule on these sets (all one container), so it is not used.
 */
export function blockCap(types: number): number {
	return Math.min(MAX_BLOCKS, 1_000 + 50 * types);
}

export interface FilledBox {
	/** Index into the prepared items. */
	item: number;
	extent: OrientedExtent;
	x: number;
	y: number;
	z: number;
}

export interface FillResult {
	boxes: FilledBox[];
	/** Pieces placed per item index. */
	placed: number[];
	volume: number;
	stoppedBy: StopReason;
	/** Work units spent (see work-budget.ts). */
	work: number;
}

/** Whether `item` could go into an empty container `c` on its own. */
export function canTake(item: PreparedItem, c: PreparedContainer): boolean {
	return item.weight <= c.payload && coreBoxType(item, c, 1).extents.length > 0;
}

export function fillContainer(
	items: readonly PreparedItem[],
	remaining: readonly number[],
	c: PreparedContainer,
	work: number,
	deadline: number,
	seed: number
): FillResult {
	const index: number[] = [];
	const types = [];
	for (let i = 0; i < items.length; i++) {
		if (remaining[i]! > 0 && canTake(items[i]!, c)) {
			index.push(i);
			types.push(coreBoxType(items[i]!, c, remaining[i]!));
		}
	}
	const placed = items.map(() => 0);
	if (types.length === 0) return { boxes: [], placed, volume: 0, stoppedBy: 'complete', work: 0 };
	const problem: CoreProblem = {
		container: { L: c.L, W: c.W, H: c.H, payload: c.payload },
		types
	};
	const m = meter(work, deadline);
	// Block generation may use at most BLOCK_WORK_SHARE of the work (it rarely needs it).
	const blocks = generateBlocks(types, problem.container, {
		maxBlocks: blockCap(types.length),
		meter: m,
		maxWork: work * BLOCK_WORK_SHARE
	});
	const result = beamSearch(problem, blockTable(blocks), {
		meter: m,
		maxWidth: MAX_WIDTH,
		children: CHILDREN,
		seed
	});
	const boxes = expandPlaced(problem, result.state.placed).map((b) => {
		const item = index[b.type]!;
		placed[item]!++;
		return { item, extent: b.extent, x: b.x, y: b.y, z: b.z };
	});
	return { boxes, placed, volume: result.state.vol, stoppedBy: result.stoppedBy, work: m.used };
}
