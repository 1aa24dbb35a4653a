// A deterministic 500-line measure input for the benchmarks (Part A in-process, Part B over HTTP).
// 50 invented products in three families with plausible cartons; lines cycle through them.
import { palletSpecFromType } from '../../src/lib/packing/pallets';
import type { MeasureInput, ProductInput } from '../../src/lib/packing/schema';
import { palletType } from '../../src/lib/reference/equipment';

export const BENCH_LINES = 500;
export const BENCH_PRODUCTS = 50;

/** mulberry32: small seeded PRNG so every run measures the same shipment. */
export function prng(seed: number): () => number {
	let a = seed >>> 0;
	return () => {
		a = (a + 0x6d2b79f5) >>> 0;
		let t = a;
		t = Math.imul(t ^ (t >>> 15), t | 1);
		t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
		return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
	};
}

function between(rand: () => number, lo: number, hi: number): number {
	return lo + Math.floor(rand() * (hi - lo + 1));
}

interface Family {
	prefix: string;
	netKg: [number, number];
	units: [number, number];
	lengthMm: [number, number];
	widthMm: [number, number];
	heightMm: [number, number];
}

// Sensors (many light units), speakers and power banks (a dozen or so), floor speakers (one or two).
const FAMILIES: Family[] = [
	{
		prefix: 'SNS',
		netKg: [0.03, 0.2],
		units: [40, 120],
		lengthMm: [350, 420],
		widthMm: [260, 320],
		heightMm: [180, 260]
	},
	{
		prefix: 'SPK',
		netKg: [0.3, 1.6],
		units: [6, 24],
		lengthMm: [380, 600],
		widthMm: [280, 400],
		heightMm: [220, 380]
	},
	{
		prefix: 'TWR',
		netKg: [6, 16],
		units: [1, 2],
		lengthMm: [700, 1150],
		widthMm: [380, 560],
		heightMm: [350, 600]
	}
];

export function benchProducts(seed = 20261201): ProductInput[] {
	const rand = prng(seed);
	return Array.from({ length: BENCH_PRODUCTS }, (_, i) => {
		const family = FAMILIES[i % FAMILIES.length]!;
		const net = family.netKg[0] + rand() * (family.netKg[1] - family.netKg[0]);
		const netKg = net.toFixed(4);
		const units = between(rand, ...family.units);
		const tare = 0.35 + rand() * 1.5; // carton, inserts and dunnage
		const stackable = rand() > 0.1;
		return {
			sku: `BENCH-${family.prefix}-${String(i + 1).padStart(3, '0')}`,
			netKgPerUnit: netKg,
			packaging: {
				unitsPerCarton: units,
				lengthMm: between(rand, ...family.lengthMm),
				widthMm: between(rand, ...family.widthMm),
				heightMm: between(rand, ...family.heightMm),
				cartonGrossKg: (units * Number(netKg) + tare).toFixed(3),
				orientation: rand() < 0.6 ? 'this_way_up' : 'any',
				maxLoadOnTopKg: stackable ? String(between(rand, 4, 16) * 10) : null
			}
		};
	});
}

/** The 500-line shipment; with `pallet`, loaded on EUR pallets (P1208 from data/pallet-types.json). */
export function benchInput(options: { pallet: boolean; seed?: number }): MeasureInput {
	const seed = options.seed ?? 20261201;
	const products = benchProducts(seed);
	const rand = prng(seed + 1);
	const lines = Array.from({ length: BENCH_LINES }, (_, i) => ({
		sku: products[i % products.length]!.sku,
		quantity: between(rand, 1, 5000)
	}));
	if (!options.pallet) return { products, lines };
	const type = palletType('P1208');
	if (!type) throw new Error('pallet type P1208 missing from data/pallet-types.json');
	return { products, lines, pallet: palletSpecFromType(type) };
}
