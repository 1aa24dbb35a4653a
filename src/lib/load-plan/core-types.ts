/**
 * The numeric problem the search works on (internal): one container, box types with their allowed
 * extents already filtered for the container's inside and door, masses in whole milligrams
 * (kg × 10⁶: exact integers in JS numbers up to about 9·10⁹ kg).
 */
import type { OrientedExtent } from './orientations';

/** Nothing may rest on it. */
export const NO_LOAD = -1;

export interface CoreBoxType {
	/** Allowed extents that fit the inside and pass the door. */
	extents: OrientedExtent[];
	count: number;
	/** Mass of one piece, mg. */
	weight: number;
	/** Largest mass on top, mg: Infinity when unlimited, NO_LOAD when not stackable. */
	cap: number;
	volume: number;
}

export interface CoreContainer {
	L: number;
	W: number;
	H: number;
	/** Largest cargo mass, mg (Infinity for none). */
	payload: number;
}

export interface CoreProblem {
	container: CoreContainer;
	types: CoreBoxType[];
}

/** One box of a solution, in container coordinates. */
export interface CoreBox {
	type: number;
	extent: OrientedExtent;
	x: number;
	y: number;
	z: number;
}
