import Decimal from 'decimal.js';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { palletType } from '../reference/equipment';
import {
	palletSpecFromType,
	palletStowage,
	planPallets,
	type PalletCarton,
	type PalletPlan,
	type PalletSpec
} from './pallets';

// EUR pallet: EPAL e.V., EPAL Euro pallet (EPAL 1) product specification: 1200 × 800 × 144 mm,
// about 25 kg, safe working load 1500 kg (checked, see data/pallet-types.json); 1800 mm loaded
// height is Landfall's planning default (common practice).
const eur: PalletSpec = {
	lengthMm: 1200,
	widthMm: 800,
	deckHeightMm: 144,
	tareKg: '25',
	maxGrossKg: '1525',
	maxLoadedHeightMm: 1800
};

const carton: PalletCarton = {
	lengthMm: 400,
	widthMm: 300,
	heightMm: 250,
	grossKg: '13.2',
	orientation: 'this_way_up',
	maxLoadOnTopKg: '120'
};

function plan(
	cartons: number,
	c: PalletCarton = carton,
	extra: Partial<Parameters<typeof planPallets>[0]> = {}
): PalletPlan {
	const result = planPallets({ pallet: eur, carton: c, cartons, ...extra });
	if (!result.ok) throw new Error(result.message);
	return result.plan;
}

describe('the reference EUR pallet as plain input', () => {
	it('maps the equipment record’s height to the deck height', () => {
		const type = palletType('P1208');
		if (type === undefined) throw new Error('no P1208');
		expect(palletSpecFromType(type)).toEqual(eur);
	});
});

describe('cartons per pallet', () => {
	it('is limited by height: 8 per layer × 6 layers = 48', () => {
		// 8 per layer (400 × 300 on 1200 × 800, see layer-pattern.test.ts).
		// Height: (1800 − 144) ÷ 250 = 6.6 → 6 layers. Stacking: 120 ÷ 13.2 = 9.09 → 9 on top →
		// 10 layers. Mass: (1525 − 25) ÷ 13.2 = 113.6 → 113 cartons. So 48, loaded 144 + 6 × 250 =
		// 1644 mm, gross 25 + 48 × 13.2 = 658.6 kg.
		const result = palletStowage(eur, carton);
		expect(result.ok).toBe(true);
		if (!result.ok) return;
		expect(result.stowage).toMatchObject({
			verticalSide: 'height',
			perLayer: 8,
			layersByHeight: 6,
			layersByStacking: 10,
			cartonsByWeight: 113,
			cartonsPerPallet: 48,
			layersPerPallet: 6,
			loadedHeightMm: 1644,
			limitedBy: 'height'
		});
		expect(result.stowage.pattern.areaBound).toBe(8);
		expect(plan(48).groups[0]?.grossKgPerPallet).toBe('658.600');
	});

	it('is limited by mass, with a part-filled top layer', () => {
		// 40 kg cartons: (1525 − 25) ÷ 40 = 37.5 → 37 cartons; 37 ÷ 8 → 5 layers (top layer 5),
		// 144 + 5 × 250 = 1394 mm; gross 25 + 37 × 40 = 1505 kg ≤ 1525.
		const result = palletStowage(eur, { ...carton, grossKg: '40', maxLoadOnTopKg: '500' });
		expect(result.ok && result.stowage).toMatchObject({
			cartonsPerPallet: 37,
			layersPerPallet: 5,
			loadedHeightMm: 1394,
			limitedBy: 'weight'
		});
	});

	it('is limited by stacking: the bottom carton carries (layers − 1) × gross', () => {
		// 30 kg on top ÷ 13.2 = 2.27 → 2 cartons on top → 3 layers = 24 cartons, 144 + 750 = 894 mm.
		const result = palletStowage(eur, { ...carton, maxLoadOnTopKg: '30' });
		expect(result.ok && result.stowage).toMatchObject({
			layersByStacking: 3,
			cartonsPerPallet: 24,
			loadedHeightMm: 894,
			limitedBy: 'stacking'
		});
	});

	it('puts one layer only when cartons must not be stacked on', () => {
		const result = palletStowage(eur, { ...carton, maxLoadOnTopKg: null });
		expect(result.ok && result.stowage).toMatchObject({
			layersByStacking: 1,
			cartonsPerPallet: 8,
			loadedHeightMm: 394
		});
	});

	it('stands a carton on another face when allowed and better', () => {
		// 500 × 400 × 900 mm, this way up: 4 per layer (area bound floor(960,000 ÷ 200,000) = 4),
		// (1656 ÷ 900) → 1 layer = 4 per pallet. On its side with the 500 mm length vertical:
		// footprint 400 × 900, 900 along the 1200 side, 2 across (2 × 400 = 800) = 2 per layer,
		// 1656 ÷ 500 → 3 layers = 6 per pallet. With the 400 mm width vertical: footprint 500 × 900,
		// 1 per layer × 4 layers = 4.
		const tall: PalletCarton = {
			...carton,
			lengthMm: 500,
			widthMm: 400,
			heightMm: 900,
			maxLoadOnTopKg: '1000'
		};
		const upright = palletStowage(eur, tall);
		expect(upright.ok && upright.stowage.cartonsPerPallet).toBe(4);
		const any = palletStowage(eur, { ...tall, orientation: 'any' });
		expect(any.ok && any.stowage).toMatchObject({
			verticalSide: 'length',
			layerHeightMm: 500,
			perLayer: 2,
			cartonsPerPallet: 6,
			loadedHeightMm: 1644
		});
		expect(any.ok && any.stowage.tried).toEqual([
			{ verticalSide: 'height', perLayer: 4, cartonsPerPallet: 4 },
			{ verticalSide: 'length', perLayer: 2, cartonsPerPallet: 6 },
			{ verticalSide: 'width', perLayer: 1, cartonsPerPallet: 4 }
		]);
	});

	it('keeps the height vertical on a tie, even when lying down would be lower', () => {
		// 150 kg cartons: (1525 − 25) ÷ 150 = 10 per pallet whichever face. Upright: 8 per layer →
		// 2 layers, 144 + 2 × 250 = 644 mm. Length vertical: footprint 300 × 250, 4 × 3 = 12 per
		// layer → 1 layer, 144 + 400 = 544 mm. Tie on 10 cartons: stays upright.
		const result = palletStowage(eur, {
			...carton,
			grossKg: '150',
			maxLoadOnTopKg: '1500',
			orientation: 'any'
		});
		expect(result.ok && result.stowage).toMatchObject({
			verticalSide: 'height',
			cartonsPerPallet: 10,
			loadedHeightMm: 644
		});
		expect(result.ok && result.stowage.tried[1]).toEqual({
			verticalSide: 'length',
			perLayer: 12,
			cartonsPerPallet: 10
		});
	});
});

describe('cartons that cannot go on the pallet: an error result, not a throw', () => {
	it('reports a footprint too big', () => {
		const result = planPallets({
			pallet: eur,
			carton: { ...carton, lengthMm: 1300, widthMm: 900, orientation: 'any', heightMm: 1000 },
			cartons: 3
		});
		expect(result).toMatchObject({ ok: false, reason: 'footprint', problems: [] });
		expect(!result.ok && result.message).toMatch(/does not fit within the 1200 × 800 mm pallet/);
	});

	it('reports a carton too tall to stand this way up', () => {
		// 144 + 1700 = 1844 mm > 1800 mm.
		const result = planPallets({ pallet: eur, carton: { ...carton, heightMm: 1700 }, cartons: 1 });
		expect(result).toMatchObject({ ok: false, reason: 'height' });
		expect(!result.ok && result.message).toMatch(/1800 mm maximum loaded height/);
		// Under a 1000 mm limit a 1000 mm tall carton cannot stand (144 + 1000 > 1000) but may lie
		// down when allowed. Length (400) vertical: footprint 300 × 1000, 2 per layer, 856 ÷ 400 → 2
		// layers = 4, 944 mm. Width (300) vertical: footprint 400 × 1000, 2 per layer, 856 ÷ 300 → 2
		// layers = 4, 744 mm. A tie on cartons goes to the lower load.
		const low = { ...eur, maxLoadedHeightMm: 1000 };
		const tall = { ...carton, heightMm: 1000 };
		expect(planPallets({ pallet: low, carton: tall, cartons: 1 })).toMatchObject({
			ok: false,
			reason: 'height'
		});
		const lying = planPallets({ pallet: low, carton: { ...tall, orientation: 'any' }, cartons: 1 });
		expect(lying.ok && lying.plan.stowage).toMatchObject({
			verticalSide: 'width',
			cartonsPerPallet: 4,
			layersPerPallet: 2,
			loadedHeightMm: 744
		});
	});

	it('reports a carton too heavy for the pallet', () => {
		const result = planPallets({
			pallet: eur,
			carton: { ...carton, grossKg: '1500.001' },
			cartons: 1
		});
		expect(result).toMatchObject({ ok: false, reason: 'weight' });
	});

	it('reports bad input by path', () => {
		const result = planPallets({
			pallet: { ...eur, maxLoadedHeightMm: 100 },
			carton: { ...carton, grossKg: '0' },
			cartons: 0
		});
		expect(result.ok).toBe(false);
		if (result.ok) return;
		expect(result.reason).toBe('invalid_input');
		expect(result.problems.map((p) => p.path).sort()).toEqual([
			'carton.grossKg',
			'cartons',
			'pallet.maxLoadedHeightMm'
		]);
	});
});

describe('pallets for a line', () => {
	it('makes full pallets and one part pallet', () => {
		// 100 cartons, 48 per pallet: 2 full + 1 of 4 cartons (1 layer, 144 + 250 = 394 mm,
		// 25 + 4 × 13.2 = 77.8 kg). Total 3 × 25 + 100 × 13.2 = 1395 kg; volume
		// 2 × 1.2 × 0.8 × 1.644 + 1.2 × 0.8 × 0.394 = 3.15648 + 0.37824 = 3.53472 m³.
		const p = plan(100);
		expect(p).toMatchObject({
			pallets: 3,
			fullPallets: 2,
			partPallets: 1,
			firstPallet: 1,
			lastPallet: 3,
			grossKg: '1395.000',
			volumeM3: '3.534720'
		});
		expect(p.groups).toEqual([
			{
				fromPallet: 1,
				toPallet: 2,
				pallets: 2,
				cartonsPerPallet: 48,
				layers: 6,
				loadedHeightMm: 1644,
				grossKgPerPallet: '658.600',
				firstCarton: 1,
				lastCarton: 96
			},
			{
				fromPallet: 3,
				toPallet: 3,
				pallets: 1,
				cartonsPerPallet: 4,
				layers: 1,
				loadedHeightMm: 394,
				grossKgPerPallet: '77.800',
				firstCarton: 97,
				lastCarton: 100
			}
		]);
	});

	it('puts the lighter remainder carton on the last pallet, numbered on from earlier lines', () => {
		// 96 cartons, the last holding 3.2 kg: pallet 5 = 48 × 13.2 + 25 = 658.6 kg; pallet 6 =
		// 25 + 47 × 13.2 + 3.2 = 648.6 kg. Cartons 41–136.
		const p = plan(96, carton, { lastCartonGrossKg: '3.2', firstCarton: 41, firstPallet: 5 });
		expect(
			p.groups.map((g) => [
				g.fromPallet,
				g.cartonsPerPallet,
				g.grossKgPerPallet,
				g.firstCarton,
				g.lastCarton
			])
		).toEqual([
			[5, 48, '658.600', 41, 88],
			[6, 48, '648.600', 89, 136]
		]);
		expect(p).toMatchObject({ fullPallets: 2, partPallets: 0, lastPallet: 6 });
	});

	it('refuses a last carton heavier than a full one', () => {
		const result = planPallets({ pallet: eur, carton, cartons: 2, lastCartonGrossKg: '14' });
		expect(result.ok).toBe(false);
	});
});

const cartonArb: fc.Arbitrary<PalletCarton> = fc.record({
	lengthMm: fc.integer({ min: 100, max: 900 }),
	widthMm: fc.integer({ min: 100, max: 800 }),
	heightMm: fc.integer({ min: 100, max: 900 }),
	grossKg: fc.integer({ min: 500, max: 60_000 }).map((g) => new Decimal(g).div(1000).toFixed()),
	orientation: fc.constantFrom('any' as const, 'this_way_up' as const),
	maxLoadOnTopKg: fc.option(fc.integer({ min: 0, max: 800 }).map(String), { nil: null })
});

describe('properties', () => {
	it('conserves cartons and keeps every pallet within its limits', () => {
		fc.assert(
			fc.property(cartonArb, fc.integer({ min: 1, max: 2000 }), (c, cartons) => {
				const result = planPallets({ pallet: eur, carton: c, cartons });
				if (!result.ok) return; // cannot go on this pallet: covered above
				const p = result.plan;
				expect(p.groups.reduce((s, g) => s + g.pallets * g.cartonsPerPallet, 0)).toBe(cartons);
				expect(p.groups.reduce((s, g) => s + g.pallets, 0)).toBe(p.pallets);
				expect(p.groups[0]?.firstCarton).toBe(1);
				expect(p.groups.at(-1)?.lastCarton).toBe(cartons);
				for (const g of p.groups) {
					expect(g.loadedHeightMm).toBeLessThanOrEqual(eur.maxLoadedHeightMm);
					expect(new Decimal(g.grossKgPerPallet).lte(eur.maxGrossKg)).toBe(true);
					const onBottom = new Decimal(c.grossKg).times(g.layers - 1);
					if (c.maxLoadOnTopKg === null) expect(g.layers).toBe(1);
					else expect(onBottom.lte(c.maxLoadOnTopKg)).toBe(true);
				}
			})
		);
	});

	it('never needs fewer pallets for more cartons', () => {
		fc.assert(
			fc.property(
				cartonArb,
				fc.integer({ min: 1, max: 2000 }),
				fc.integer({ min: 1, max: 500 }),
				(c, n, more) => {
					const a = planPallets({ pallet: eur, carton: c, cartons: n });
					const b = planPallets({ pallet: eur, carton: c, cartons: n + more });
					expect(a.ok).toBe(b.ok);
					if (!a.ok || !b.ok) return;
					expect(b.plan.pallets).toBeGreaterThanOrEqual(a.plan.pallets);
					expect(new Decimal(b.plan.grossKg).gte(a.plan.grossKg)).toBe(true);
					expect(new Decimal(b.plan.volumeM3).gte(a.plan.volumeM3)).toBe(true);
				}
			)
		);
	});
});
