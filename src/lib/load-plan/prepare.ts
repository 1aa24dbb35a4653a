/**
 * Validated input → the numbers the search uses: masses in whole milligrams, stacking caps, and
 * per container type the allowed extents that fit the inside and pass the door.
 *
 * Door rule: a piece goes in through the door in the orientation it is stowed in (cargo is
 * normally loaded that way), so a placed orientation is allowed only when its width (y) and
 * height (z) are within the door opening. Its length (x) runs along the container.
 */
import Decimal from 'decimal.js';
import { NO_LOAD, type CoreBoxType } from './core-types';
import { allowedExtents, type OrientedExtent } from './orientations';
import type { LoadContainerType, LoadItemType } from './types';

const MG_PER_KG = new Decimal(1_000_000);

/** kg string (≤ 6 decimals) → whole milligrams, exact in a JS number. */
export function kgToMg(kg: string): number {
	return new Decimal(kg).times(MG_PER_KG).toNumber();
}

export interface PreparedItem {
	source: LoadItemType;
	weight: number;
	cap: number;
	volume: number;
	/** All extents the orientation rule allows, before any container is considered. */
	extents: OrientedExtent[];
}

export interface PreparedContainer {
	source: LoadContainerType;
	L: number;
	W: number;
	H: number;
	payload: number;
	volume: number;
}

export function prepareItem(item: LoadItemType): PreparedItem {
	const cap =
		item.stackable === false
			? NO_LOAD
			: item.maxLoadOnTopKg === undefined
				? Infinity
				: kgToMg(item.maxLoadOnTopKg);
	return {
		source: item,
		weight: kgToMg(item.weightKg),
		cap,
		volume: item.lengthMm * item.widthMm * item.heightMm,
		extents: allowedExtents(item.lengthMm, item.widthMm, item.heightMm, item.orientations)
	};
}

export function prepareContainer(c: LoadContainerType): PreparedContainer {
	return {
		source: c,
		L: c.lengthMm,
		W: c.widthMm,
		H: c.heightMm,
		payload: kgToMg(c.maxPayloadKg),
		volume: c.lengthMm * c.widthMm * c.heightMm
	};
}

export function insideExtents(item: PreparedItem, c: PreparedContainer): OrientedExtent[] {
	return item.extents.filter((e) => e.dx <= c.L && e.dy <= c.W && e.dz <= c.H);
}

/** Extents that fit inside and pass the door (the ones the search may use). */
export function usableExtents(item: PreparedItem, c: PreparedContainer): OrientedExtent[] {
	const door = c.source;
	return insideExtents(item, c).filter(
		(e) => e.dy <= door.doorWidthMm && e.dz <= door.doorHeightMm
	);
}

/** The search's box type for `count` pieces of `item` in container `c`. */
export function coreBoxType(item: PreparedItem, c: PreparedContainer, count: number): CoreBoxType {
	return {
		extents: usableExtents(item, c),
		count,
		weight: item.weight,
		cap: item.cap,
		volume: item.volume
	};
}
