import type { MeasureInput } from './packing/schema';

// Builds the packing module's input from stored products and lines (server, page and API alike).
export interface StoredProduct {
	sku: string;
	netKgPerUnit: string;
	packaging: {
		unitsPerCarton: number;
		cartonLengthMm: number;
		cartonWidthMm: number;
		cartonHeightMm: number;
		cartonGrossKg: string;
		orientation: 'any' | 'this_way_up';
		maxLoadOnTopKg: string | null;
	} | null;
}

export interface StoredPallet {
	lengthMm: number;
	widthMm: number;
	deckHeightMm: number;
	tareKg: string;
	maxGrossKg: string;
	maxLoadedHeightMm: number;
}

export function measureInputFrom(
	products: StoredProduct[],
	lines: { sku: string; quantity: number }[],
	pallet: StoredPallet | null
): MeasureInput {
	const used = new Set(lines.map((l) => l.sku));
	return {
		products: products
			.filter((p) => used.has(p.sku))
			.map((p) => ({
				sku: p.sku,
				netKgPerUnit: p.netKgPerUnit,
				packaging: p.packaging && {
					unitsPerCarton: p.packaging.unitsPerCarton,
					lengthMm: p.packaging.cartonLengthMm,
					widthMm: p.packaging.cartonWidthMm,
					heightMm: p.packaging.cartonHeightMm,
					cartonGrossKg: p.packaging.cartonGrossKg,
					orientation: p.packaging.orientation,
					maxLoadOnTopKg: p.packaging.maxLoadOnTopKg
				}
			})),
		lines: lines.map((l) => ({ sku: l.sku, quantity: l.quantity })),
		...(pallet
			? {
					pallet: {
						lengthMm: pallet.lengthMm,
						widthMm: pallet.widthMm,
						deckHeightMm: pallet.deckHeightMm,
						tareKg: pallet.tareKg,
						maxGrossKg: pallet.maxGrossKg,
						maxLoadedHeightMm: pallet.maxLoadedHeightMm
					}
				}
			: {})
	};
}
