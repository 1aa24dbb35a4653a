import { describe, expect, it } from 'vitest';
import { validateLoadInput } from './load-plan';
import { shipmentLoadInput, type StoredContainerType } from './load-plan-input';
import { measure, type MeasureResult } from './packing';

// ISO 668 1CC (20 ft) with typical builder internal figures, as in data/container-types.json
// (internal size and door: common practice; payload = max gross − tare).
const C20GP: StoredContainerType = {
	code: 'C20GP',
	name: '20 ft standard dry container',
	iso6346SizeType: '22G1',
	internalLengthMm: 5896,
	internalWidthMm: 2350,
	internalHeightMm: 2393,
	doorWidthMm: 2340,
	doorHeightMm: 2274,
	maxPayloadKg: '28180.000'
};

const products = [
	{
		sku: 'SPK-1',
		netKgPerUnit: '1.5',
		packaging: {
			unitsPerCarton: 4,
			lengthMm: 400,
			widthMm: 300,
			heightMm: 250,
			cartonGrossKg: '6.8',
			orientation: 'this_way_up' as const,
			maxLoadOnTopKg: '60'
		}
	},
	{
		sku: 'BAT-2',
		netKgPerUnit: '0.5',
		packaging: {
			unitsPerCarton: 10,
			lengthMm: 300,
			widthMm: 200,
			heightMm: 200,
			cartonGrossKg: '5.4',
			orientation: 'any' as const,
			maxLoadOnTopKg: null
		}
	}
];

const handling = new Map(products.map((p) => [p.sku, p.packaging]));

function measured(input: Parameters<typeof measure>[0]): Extract<MeasureResult, { ok: true }> {
	const result = measure(input);
	if (!result.ok) throw new Error(JSON.stringify(result.problems));
	return result;
}

describe('shipmentLoadInput', () => {
	it('gives full and part-filled cartons as item types with their own gross', () => {
		// 10 units at 4 per carton: 2 full cartons and one of 2 units (arithmetic).
		const m = measured({ products, lines: [{ sku: 'SPK-1', quantity: 10 }] });
		const out = shipmentLoadInput(m, handling, [C20GP]);
		expect(out.items).toEqual([
			{
				id: 'L1-C1',
				label: 'SPK-1, line 1, cartons 1–2',
				lengthMm: 400,
				widthMm: 300,
				heightMm: 250,
				weightKg: '6.800',
				count: 2,
				orientations: 'thisWayUp',
				stackable: true,
				maxLoadOnTopKg: '60'
			},
			{
				id: 'L1-C3',
				label: 'SPK-1, line 1, carton 3 (part-filled)',
				lengthMm: 400,
				widthMm: 300,
				heightMm: 250,
				// tare 6.8 − 4 × 1.5 = 0.8 kg, plus 2 × 1.5 kg (arithmetic)
				weightKg: '3.800',
				count: 1,
				orientations: 'thisWayUp',
				stackable: true,
				maxLoadOnTopKg: '60'
			}
		]);
		expect(out.info.map((i) => [i.id, i.sku, i.kind, i.count])).toEqual([
			['L1-C1', 'SPK-1', 'carton', 2],
			['L1-C3', 'SPK-1', 'carton', 1]
		]);
		expect(validateLoadInput(out)).toEqual([]);
	});

	it('marks a carton with no stacking limit as not stackable and "any" as any face', () => {
		const m = measured({ products, lines: [{ sku: 'BAT-2', quantity: 30 }] });
		const [item] = shipmentLoadInput(m, handling, [C20GP]).items;
		expect(item).toMatchObject({ orientations: 'any', stackable: false, count: 3 });
		expect(item).not.toHaveProperty('maxLoadOnTopKg');
	});

	it('numbers carton items across lines, as the packing list does', () => {
		const m = measured({
			products,
			lines: [
				{ sku: 'SPK-1', quantity: 8 },
				{ sku: 'BAT-2', quantity: 20 }
			]
		});
		const out = shipmentLoadInput(m, handling, [C20GP]);
		expect(out.items.map((i) => i.id)).toEqual(['L1-C1', 'L2-C3']);
		expect(out.items[1]!.label).toBe('BAT-2, line 2, cartons 3–4');
	});

	it('gives loaded pallets as this-way-up, non-stackable items when palletised', () => {
		// ISO 6780 1200 × 800 pallet (EUR size), tare 25 kg (common practice).
		const m = measured({
			products,
			lines: [{ sku: 'SPK-1', quantity: 400 }],
			pallet: {
				lengthMm: 1200,
				widthMm: 800,
				deckHeightMm: 144,
				tareKg: '25',
				maxGrossKg: '1000',
				maxLoadedHeightMm: 1800
			}
		});
		const out = shipmentLoadInput(m, handling, [C20GP]);
		const pallets = m.pallets!.lines[0]!.plan;
		expect(out.items.reduce((n, i) => n + i.count, 0)).toBe(pallets.pallets);
		for (const [k, item] of out.items.entries()) {
			const group = pallets.groups[k]!;
			expect(item).toMatchObject({
				lengthMm: 1200,
				widthMm: 800,
				heightMm: group.loadedHeightMm,
				weightKg: group.grossKgPerPallet,
				orientations: 'thisWayUp',
				stackable: false
			});
		}
		expect(out.info.every((i) => i.kind === 'pallet' && i.sku === 'SPK-1')).toBe(true);
	});

	it('offers each container type by its code with its internal size, door and payload', () => {
		const m = measured({ products, lines: [{ sku: 'SPK-1', quantity: 4 }] });
		const out = shipmentLoadInput(m, handling, [C20GP]);
		expect(out.containers).toEqual([
			{
				id: 'C20GP',
				code: '22G1',
				lengthMm: 5896,
				widthMm: 2350,
				heightMm: 2393,
				doorWidthMm: 2340,
				doorHeightMm: 2274,
				maxPayloadKg: '28180.000'
			}
		]);
		expect(out.containerNames).toEqual({ C20GP: '20 ft standard dry container' });
	});
});
