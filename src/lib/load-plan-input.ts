/**
 * A measured shipment → the container load planner's input: its cartons (full ones, and each
 * line's part-filled last carton, with its own gross) or, when the shipment is palletised, its
 * loaded pallets; and the candidate container types. Each item keeps its SKU so the picture can
 * colour by product.
 *
 * Pure module: no framework imports.
 */
import { palletItem, type LoadContainerType, type LoadItemType, type LoadPlan } from './load-plan';
import type { MeasureResult } from './packing';

type Measured = Extract<MeasureResult, { ok: true }>;

/** What the planner needs of a product's carton besides its size (from the product's packaging). */
export interface CartonHandling {
	orientation: 'any' | 'this_way_up';
	/** null: nothing may be stacked on it. */
	maxLoadOnTopKg: string | null;
}

export interface StoredContainerType {
	code: string;
	name: string;
	iso6346SizeType: string;
	internalLengthMm: number;
	internalWidthMm: number;
	internalHeightMm: number;
	doorWidthMm: number;
	doorHeightMm: number;
	maxPayloadKg: string;
}

/** What an item type is, for legends and the loading sequence. */
export interface LoadItemInfo {
	id: string;
	sku: string;
	kind: 'carton' | 'pallet';
	/** Line number (1-based) on the shipment. */
	line: number;
	/** Carton or pallet numbers it stands for, e.g. "cartons 1–119", and the first of them. */
	numbers: string;
	first: number;
	count: number;
}

export interface ShipmentLoadInput {
	items: LoadItemType[];
	containers: LoadContainerType[];
	info: LoadItemInfo[];
	/** Container type id (its code) → name. */
	containerNames: Record<string, string>;
}

/** A shipment's load plan as the API and the shipment page give it. */
export interface ShipmentLoadPlanView {
	shipmentId: string;
	reference: string;
	/** The shipment revision the plan was made for. */
	version: number;
	computedAt: string;
	/** true: read from the cache, not computed by this request. */
	cached: boolean;
	items: LoadItemType[];
	/** Per item type: its SKU, line and carton or pallet numbers. */
	info: LoadItemInfo[];
	containerTypes: (LoadContainerType & { name: string })[];
	plan: LoadPlan;
}

function range(noun: string, from: number, to: number): string {
	return from === to ? `${noun} ${from}` : `${noun}s ${from}–${to}`;
}

function string(value: string | number): string {
	return String(value);
}

/** The candidate containers: every container type, keyed by its code. */
export function loadContainers(types: readonly StoredContainerType[]): LoadContainerType[] {
	return types.map((t) => ({
		id: t.code,
		code: t.iso6346SizeType,
		lengthMm: t.internalLengthMm,
		widthMm: t.internalWidthMm,
		heightMm: t.internalHeightMm,
		doorWidthMm: t.doorWidthMm,
		doorHeightMm: t.doorHeightMm,
		maxPayloadKg: string(t.maxPayloadKg)
	}));
}

function cartonItems(measured: Measured, handling: ReadonlyMap<string, CartonHandling>) {
	const items: LoadItemType[] = [];
	const info: LoadItemInfo[] = [];
	for (const line of measured.lines) {
		const how = handling.get(line.sku);
		if (how === undefined) throw new Error(`No packaging for SKU ${line.sku}`);
		const n = line.lineIndex + 1;
		for (const group of line.groups) {
			const part = group.unitsPerCarton < line.unitsPerCarton;
			const id = `L${n}-C${group.fromCarton}`;
			const numbers = range('carton', group.fromCarton, group.toCarton);
			const item: LoadItemType = {
				id,
				label: `${line.sku}, line ${n}, ${numbers}${part ? ' (part-filled)' : ''}`,
				lengthMm: line.carton.lengthMm,
				widthMm: line.carton.widthMm,
				heightMm: line.carton.heightMm,
				weightKg: group.grossKgPerCarton,
				count: group.cartons,
				orientations: how.orientation === 'this_way_up' ? 'thisWayUp' : 'any',
				stackable: how.maxLoadOnTopKg !== null
			};
			if (how.maxLoadOnTopKg !== null) item.maxLoadOnTopKg = string(how.maxLoadOnTopKg);
			items.push(item);
			info.push({
				id,
				sku: line.sku,
				kind: 'carton',
				line: n,
				numbers,
				first: group.fromCarton,
				count: group.cartons
			});
		}
	}
	return { items, info };
}

function palletItems(pallets: NonNullable<Measured['pallets']>) {
	const items: LoadItemType[] = [];
	const info: LoadItemInfo[] = [];
	for (const line of pallets.lines) {
		const n = line.lineIndex + 1;
		for (const group of line.plan.groups) {
			const id = `L${n}-P${group.fromPallet}`;
			const numbers = range('pallet', group.fromPallet, group.toPallet);
			// Loaded pallets carry nothing: no pallet type in Landfall is marked for double-stacking.
			items.push(
				palletItem({
					id,
					label: `${line.sku}, line ${n}, ${numbers}`,
					lengthMm: pallets.pallet.lengthMm,
					widthMm: pallets.pallet.widthMm,
					loadedHeightMm: group.loadedHeightMm,
					grossKg: group.grossKgPerPallet,
					count: group.pallets
				})
			);
			info.push({
				id,
				sku: line.sku,
				kind: 'pallet',
				line: n,
				numbers,
				first: group.fromPallet,
				count: group.pallets
			});
		}
	}
	return { items, info };
}

/**
 * The planner input for a measured shipment. `handling` gives each SKU's carton orientation and
 * stacking limit (the measure keeps only sizes and masses).
 */
export function shipmentLoadInput(
	measured: Measured,
	handling: ReadonlyMap<string, CartonHandling>,
	containerTypes: readonly StoredContainerType[]
): ShipmentLoadInput {
	const { items, info } =
		measured.pallets === null ? cartonItems(measured, handling) : palletItems(measured.pallets);
	return {
		items,
		containers: loadContainers(containerTypes),
		info,
		containerNames: Object.fromEntries(containerTypes.map((t) => [t.code, t.name]))
	};
}
