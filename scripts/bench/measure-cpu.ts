// Part A: measure() of a 500-line shipment, in-process, no database, no HTTP.
// Usage: tsx scripts/bench/measure-cpu.ts [iterations=200]
// Prints mean, p50, p95, max per variant and the ratio of p95 to the 20 ms target.
import { performance } from 'node:perf_hooks';
import { chargeableWeights, type ChargeablePiece } from '../../src/lib/packing/chargeable';
import { measure, type MeasureResult } from '../../src/lib/packing/measure';
import { measureInputSchema, type MeasureInput } from '../../src/lib/packing/schema';
import { BENCH_LINES, benchInput } from './measure-input';
import { ms, recordResult, summarize } from './stats';

const TARGET_MS = 20;
const ITERATIONS = Math.min(Math.max(Number(process.argv[2] ?? 200) || 200, 10), 5000);
const WARMUP = 10;
const TIME_BUDGET_MS = 8_000; // per variant: fewer runs when each is far slower than expected

type Variant = { name: string; run: () => unknown };

function variants(input: MeasureInput): Variant[] {
	const body = JSON.stringify(input);
	return [
		{ name: 'measure(input)', run: () => measure(input) },
		{
			name: 'schema.parse + measure',
			run: () => measure(measureInputSchema.parse(input))
		},
		{
			// What POST /api/v1/calc/measure does besides HTTP: body text in, JSON text out.
			name: 'JSON.parse + parse + measure + stringify',
			run: () => JSON.stringify(measure(measureInputSchema.parse(JSON.parse(body))))
		}
	];
}

/** The loose-carton pieces measure() hands to chargeableWeights(), rebuilt from its result. */
function cartonPieces(result: Extract<MeasureResult, { ok: true }>): ChargeablePiece[] {
	return result.lines.flatMap((line) =>
		line.groups.map((g) => ({
			lengthMm: line.carton.lengthMm,
			widthMm: line.carton.widthMm,
			heightMm: line.carton.heightMm,
			grossKg: g.grossKgPerCarton,
			count: g.cartons,
			label: `Line ${line.lineIndex + 1}, cartons ${g.fromCarton}–${g.toCarton}`
		}))
	);
}

function bench(variant: Variant) {
	for (let i = 0; i < WARMUP; i++) variant.run();
	const samples: number[] = [];
	const started = performance.now();
	for (let i = 0; i < ITERATIONS && performance.now() - started < TIME_BUDGET_MS; i++) {
		const t0 = performance.now();
		variant.run();
		samples.push(performance.now() - t0);
	}
	return summarize(samples);
}

console.log(
	`Part A: measure() of a ${BENCH_LINES}-line shipment, in-process (target ${TARGET_MS} ms)`
);
console.log(
	`  node ${process.version}, ${ITERATIONS} runs per variant after ${WARMUP} warm-up runs`
);

for (const pallet of [false, true]) {
	const input = benchInput({ pallet });
	const check = measure(input);
	if (!check.ok) {
		console.error('The bench input does not measure:', check.problems.slice(0, 5));
		process.exit(1);
	}
	const cartons = check.totals.cartons;
	const label = pallet ? 'on P1208 pallets' : 'loose cartons';
	console.log(
		`\n  ${label}: ${input.products.length} products, ${input.lines.length} lines, ` +
			`${check.totals.units} units, ${cartons} cartons` +
			(check.pallets ? `, ${check.pallets.pallets} pallets` : '')
	);
	console.log(
		`  ${'variant'.padEnd(42)}${'n'.padStart(5)}${'mean'.padStart(11)}${'p50'.padStart(11)}` +
			`${'p95'.padStart(11)}${'max'.padStart(11)}  p95/target`
	);
	const all = variants(input);
	for (const variant of all) {
		const s = bench(variant);
		console.log(
			`  ${variant.name.padEnd(42)}${String(s.n).padStart(5)}${ms(s.mean).padStart(11)}` +
				`${ms(s.p50).padStart(11)}${ms(s.p95).padStart(11)}${ms(s.max).padStart(11)}` +
				`  ${(s.p95 / TARGET_MS).toFixed(2)}`
		);
		if (variant === all[all.length - 1]) {
			recordResult(
				`Measure 500 lines, ${label}`,
				TARGET_MS,
				s,
				'p95 in-process: JSON.parse, schema, measure, stringify'
			);
		}
	}
	if (!pallet) {
		// Where the time goes: two parts of measure() timed on their own.
		const pieces = cartonPieces(check);
		const parts: Variant[] = [
			{ name: 'of which: measureInputSchema.parse', run: () => measureInputSchema.parse(input) },
			{
				name: `of which: chargeableWeights(${pieces.length} pieces)`,
				run: () => chargeableWeights(pieces)
			}
		];
		for (const part of parts) {
			const s = bench(part);
			console.log(
				`  ${part.name.padEnd(42)}${String(s.n).padStart(5)}${ms(s.mean).padStart(11)}` +
					`${ms(s.p50).padStart(11)}${ms(s.p95).padStart(11)}${ms(s.max).padStart(11)}`
			);
		}
	}
}
