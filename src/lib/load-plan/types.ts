/**
 * Public input and output of the container load planner. Everything here is plain JSON (no
 * classes, no functions except the optional progress callback), so a worker thread or an API
 * route can pass it through `structuredClone` / `JSON.stringify` unchanged.
 *
 * Axes of a container: x from the front wall (x = 0) towards the door (x = length), y across from
 * the left wall seen from the door, z up from the floor. All lengths are whole millimetres; all
 * masses decimal strings of kilograms (at most 6 decimals).
 */
import type { Problem } from '../packing/problem';

/**
 * Which of the item's own dimensions may stand vertical. `any`: all six orientations;
 * `thisWayUp`: height stays vertical (only turns about the vertical axis); or per-axis flags as
 * in the Bischoff & Ratcliff data (a flag allows that dimension as the height; any turn about the
 * vertical axis is then allowed too).
 */
export type OrientationRule =
	'any' | 'thisWayUp' | { lengthUp: boolean; widthUp: boolean; heightUp: boolean };

export interface LoadItemType {
	id: string;
	label: string;
	lengthMm: number;
	widthMm: number;
	heightMm: number;
	/** Gross mass of one piece, kg, e.g. "12.5". */
	weightKg: string;
	count: number;
	orientations: OrientationRule;
	/** false: nothing may rest on it. Default true. */
	stackable?: boolean;
	/** Largest mass it may carry above it, kg (see validate-plan.ts for how load is counted). */
	maxLoadOnTopKg?: string;
}

export interface LoadContainerType {
	id: string;
	/** Display code, e.g. "22G1" (ISO 6346 size-type). */
	code?: string;
	lengthMm: number;
	widthMm: number;
	heightMm: number;
	doorWidthMm: number;
	doorHeightMm: number;
	maxPayloadKg: string;
}

export interface LoadPlanProgress {
	/** Containers filled so far. */
	containers: number;
	/** Pieces placed so far / pieces to place. */
	placed: number;
	total: number;
	elapsedMs: number;
}

export interface LoadPlanOptions {
	/**
	 * Share of each item's base that must rest on the floor or on items below: 0 < s ≤ 1, default 1.
	 * The search always builds fully supported stows (which meet any share); validatePlan checks
	 * the share given here.
	 */
	supportShare?: number;
	/** 'fewest' containers (ties → smaller total volume) or 'cheapest' with `rates`. */
	objective?: 'fewest' | 'cheapest';
	/** Cost of one container per type id (decimal string, one currency), for 'cheapest'. */
	rates?: Record<string, string>;
	/**
	 * Budget of the whole search, ms on the benchmark machine: it is turned into a fixed count of
	 * work (× WORK_PER_MS, see work-budget.ts), so the plan does not depend on the machine's speed
	 * or load. Default 3000. The wall clock stops the search only as a safety net at 10 × this
	 * budget + 5 s (`search.stoppedBy` is then 'time').
	 */
	timeBudgetMs?: number;
	/** Work budget in units (overrides the one derived from timeBudgetMs). */
	workBudget?: number;
	/** Tie-break seed; the same input and seed give the same plan. Default 1. */
	seed?: number;
	/**
	 * 'balanced' (default): a stow shorter (or narrower) than the container is moved as a whole
	 * towards the door (or across) so that its centre of gravity comes nearest the middle; the gap
	 * at the front wall must then be braced (a warning says so). 'frontWall': the stow stays
	 * against the front and left walls as built. See stow-shift.ts.
	 */
	stowAt?: 'balanced' | 'frontWall';
	/** At most this many containers are opened. Default 100. */
	maxContainers?: number;
	onProgress?: (progress: LoadPlanProgress) => void;
}

export interface LoadPlanInput {
	items: LoadItemType[];
	containers: LoadContainerType[];
	options?: LoadPlanOptions;
}

/**
 * Orientation of a placed item: which of its own dimensions lies along x, y and z, as three
 * letters from L (length), W (width), H (height). 'LWH' is as given; 'WLH' turned on the spot.
 */
export type Orientation = 'LWH' | 'WLH' | 'LHW' | 'HLW' | 'WHL' | 'HWL';

export interface Placement {
	itemTypeId: string;
	/** Corner nearest the front wall, left wall and floor, mm. */
	x: number;
	y: number;
	z: number;
	/** Placed extent along x, y, z, mm. */
	lengthMm: number;
	widthMm: number;
	heightMm: number;
	orientation: Orientation;
}

export interface CentreOfGravity {
	/** Of the cargo, from the front wall / left wall / floor, mm (1 decimal). */
	xMm: number;
	yMm: number;
	zMm: number;
	/** Signed offset from the container's centre (positive: towards the door / right wall). */
	longitudinalOffsetMm: number;
	transverseOffsetMm: number;
	/** |offset| as a share of the internal length / width, e.g. "0.0312". */
	longitudinalOffsetShare: string;
	transverseOffsetShare: string;
}

export interface ContainerLoad {
	/** 1-based, in loading order of the containers. */
	index: number;
	containerTypeId: string;
	/** In a feasible loading order: every item after those it rests on. */
	placements: Placement[];
	pieces: number;
	loadedVolumeM3: string;
	/** Loaded volume / internal volume, share with 4 decimals, e.g. "0.9312". */
	volumeUtilisation: string;
	payloadKg: string;
	payloadUtilisation: string;
	centreOfGravity: CentreOfGravity | null;
	warnings: string[];
	/**
	 * How far the whole stow was moved from the front wall (x, towards the door) and across (y,
	 * positive towards the right wall) to balance it; the placements already include it.
	 */
	shift?: { xMm: number; yMm: number };
}

export interface UnplacedItems {
	itemTypeId: string;
	count: number;
	reason: string;
}

export interface LoadPlan {
	containers: ContainerLoad[];
	/** How many of each container type, in input order of the types; types not used left out. */
	containerCounts: { containerTypeId: string; count: number }[];
	/** Sum of the rates of the containers used, when a rate card was given. */
	totalCost: string | null;
	unplaced: UnplacedItems[];
	search: {
		elapsedMs: number;
		/**
		 * 'complete': the search schedule ran to its end; 'work': the work budget cut it short
		 * (the plan is the best so far, and the same on any machine); 'time': the wall-clock
		 * safety stop cut it short (best so far; this plan may depend on the machine).
		 */
		stoppedBy: 'complete' | 'work' | 'time';
		timeBudgetMs: number;
		/** Work units allowed and spent (see work-budget.ts). */
		workBudget?: number;
		workUsed?: number;
		seed: number;
	};
}

export type LoadPlanResult =
	{ ok: true; plan: LoadPlan; problems: Problem[] } | { ok: false; problems: Problem[] };
