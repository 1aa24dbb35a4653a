import type { ProductInput } from '../../schemas/products';
import type { ProductRow } from './products';

/** The edit form's starting values for a stored product (always metric, as stored). */
export function productFormValues(p: ProductRow): Partial<ProductInput> {
	const g = p.packaging;
	return {
		sku: p.sku,
		description: p.description,
		hsCode: p.hsCode,
		originCountry: p.originCountry,
		unitPrice: p.unitPrice,
		currency: p.currency,
		units: 'metric',
		netWeightPerUnit: p.netKgPerUnit,
		batteryConfig: p.batteryConfig,
		batteryChemistry: p.batteryChemistry ?? '',
		cellWh: p.cellWh ?? '',
		batteryWh: p.batteryWh ?? '',
		cellLithiumG: p.cellLithiumG ?? '',
		batteryLithiumG: p.batteryLithiumG ?? '',
		nominalVoltage: p.nominalVoltage ?? '',
		capacityAh: p.capacityAh ?? '',
		cellsPerBattery: p.cellsPerBattery ?? undefined,
		batteriesPerUnit: p.batteriesPerUnit ?? undefined,
		hasPackaging: g !== null,
		unitsPerCarton: g?.unitsPerCarton,
		cartonLength: g ? String(g.cartonLengthMm) : '',
		cartonWidth: g ? String(g.cartonWidthMm) : '',
		cartonHeight: g ? String(g.cartonHeightMm) : '',
		cartonGrossWeight: g?.cartonGrossKg ?? '',
		orientation: g?.orientation ?? 'any',
		stackable: g ? g.maxLoadOnTopKg !== null : true,
		maxLoadOnTop: g?.maxLoadOnTopKg ?? '',
		version: p.version
	};
}
