/**
 * From a load plan to what the picture and its readouts show: boxes coloured by product, the
 * legend of each container, and each loading step named by its carton or pallet number.
 *
 * Pure module: no framework imports.
 */
import type { ContainerLoad, LoadPlan } from '../load-plan';
import type { LoadItemInfo } from '../load-plan-input';
import { colourMap } from './palette';
import type { PlacedBox } from './project';

export interface Step {
	sku: string;
	kind: 'carton' | 'pallet';
	/** Carton or pallet number as on the packing list. */
	number: number;
	line: number;
	x: number;
	y: number;
	z: number;
}

export interface PlanPicture {
	/** SKU → colour, the same in every container. */
	colours: Map<string, string>;
	containers: {
		boxes: PlacedBox[];
		steps: Step[];
		legend: { sku: string; colour: string; count: number }[];
	}[];
}

export function planPicture(plan: LoadPlan, info: readonly LoadItemInfo[]): PlanPicture {
	const byId = new Map(info.map((i) => [i.id, i]));
	const colours = colourMap(info.map((i) => i.sku));
	// The k-th piece of an item type placed (across containers, in loading order) is its k-th number.
	const next = new Map<string, number>();
	const containers = plan.containers.map((c: ContainerLoad) => {
		const counts = new Map<string, number>();
		const boxes: PlacedBox[] = [];
		const steps: Step[] = [];
		for (const p of c.placements) {
			const item = byId.get(p.itemTypeId);
			const sku = item?.sku ?? p.itemTypeId;
			const k = next.get(p.itemTypeId) ?? 0;
			next.set(p.itemTypeId, k + 1);
			counts.set(sku, (counts.get(sku) ?? 0) + 1);
			boxes.push({
				x: p.x,
				y: p.y,
				z: p.z,
				dx: p.lengthMm,
				dy: p.widthMm,
				dz: p.heightMm,
				colour: colours.get(sku) ?? '#5b6f86'
			});
			steps.push({
				sku,
				kind: item?.kind ?? 'carton',
				number: (item?.first ?? 1) + k,
				line: item?.line ?? 0,
				x: p.x,
				y: p.y,
				z: p.z
			});
		}
		const legend = [...counts].map(([sku, count]) => ({
			sku,
			count,
			colour: colours.get(sku) ?? '#5b6f86'
		}));
		return { boxes, steps, legend };
	});
	return { colours, containers };
}

/** "Step 3 of 130: SLV-PBL-20 carton 3 (line 1) at x 800, y 0, z 0 mm". */
export function stepText(step: Step, n: number, of: number): string {
	return `Step ${n} of ${of}: ${step.sku} ${step.kind} ${step.number} (line ${step.line}) at x ${step.x}, y ${step.y}, z ${step.z} mm`;
}
