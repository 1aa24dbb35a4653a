/**
 * Shared inputs for the load-plan tests (internal). Container figures are typical ISO 668 1CC /
 * 1AA general-purpose boxes: inside 5898 × 2352 × 2393 mm (20 ft) and 12032 × 2352 × 2393 mm
 * (40 ft), door 2340 × 2280 mm (common practice; they vary by builder).
 */
import type { LoadContainerType, LoadItemType, LoadPlanInput } from './types';

export const GP20: LoadContainerType = {
	id: '20GP',
	code: '22G1',
	lengthMm: 5898,
	widthMm: 2352,
	heightMm: 2393,
	doorWidthMm: 2340,
	doorHeightMm: 2280,
	maxPayloadKg: '28200'
};

export const GP40: LoadContainerType = {
	id: '40GP',
	code: '42G1',
	lengthMm: 12032,
	widthMm: 2352,
	heightMm: 2393,
	doorWidthMm: 2340,
	doorHeightMm: 2280,
	maxPayloadKg: '26700'
};

export function carton(id: string, l: number, w: number, h: number, count: number): LoadItemType {
	return {
		id,
		label: `Carton ${id}`,
		lengthMm: l,
		widthMm: w,
		heightMm: h,
		weightKg: '10',
		count,
		orientations: 'any'
	};
}

/** A small box "container" whose door is its whole section. */
export function box(
	id: string,
	l: number,
	w: number,
	h: number,
	payloadKg = '100000'
): LoadContainerType {
	return {
		id,
		lengthMm: l,
		widthMm: w,
		heightMm: h,
		doorWidthMm: w,
		doorHeightMm: h,
		maxPayloadKg: payloadKg
	};
}

export function input(
	items: LoadItemType[],
	containers: LoadContainerType[],
	options: LoadPlanInput['options'] = {}
): LoadPlanInput {
	return { items, containers, options: { timeBudgetMs: 500, ...options } };
}
