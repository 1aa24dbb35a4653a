/**
 * A loaded pallet as a load-plan item: it stands on its deck ("this way up", turned about the
 * vertical axis only) and carries nothing unless the caller says it may (common practice: loaded
 * pallets are not double-stacked unless the load is built for it).
 */
import type { LoadItemType } from './types';

export interface LoadedPallet {
	id: string;
	label: string;
	/** Deck footprint, mm (e.g. ISO 1200 × 800). */
	lengthMm: number;
	widthMm: number;
	/** Deck plus cargo, mm. */
	loadedHeightMm: number;
	/** Pallet plus cargo, kg. */
	grossKg: string;
	count: number;
	/** Mass another pallet may put on it, kg; absent: not stackable. */
	maxLoadOnTopKg?: string;
}

export function palletItem(p: LoadedPallet): LoadItemType {
	const item: LoadItemType = {
		id: p.id,
		label: p.label,
		lengthMm: p.lengthMm,
		widthMm: p.widthMm,
		heightMm: p.loadedHeightMm,
		weightKg: p.grossKg,
		count: p.count,
		orientations: 'thisWayUp',
		stackable: p.maxLoadOnTopKg !== undefined
	};
	if (p.maxLoadOnTopKg !== undefined) item.maxLoadOnTopKg = p.maxLoadOnTopKg;
	return item;
}
