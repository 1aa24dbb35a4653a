// Part A of npm run bench:landed (scripts/bench/landed.sh runs it, then Part B over HTTP) — the
// landed-cost engine on a 500-line shipment (invented data), for four modes (air, sea FCL, sea
// LCL, road), run N times after warm-up runs. Prints p50/p95/max per mode against the 50 ms
// target, PASS/OVER and the ratio. A benchmark, not a test: it prints figures and never fails CI.
//
// Options (argument or environment variable):
//   --runs=N     BENCH_LANDED_RUNS   default 50
//   --lines=N    BENCH_LANDED_LINES  default 500
import os from 'node:os';
import { performance } from 'node:perf_hooks';
import { landedCost } from '../../src/lib/landed-cost';
import {
	baseInput,
	country,
	courierCard,
	line,
	rate,
	tariff
} from '../../src/lib/landed-cost/test-fixtures';
import type { LandedCostInput, RateCard, TransportMode } from '../../src/lib/landed-cost';
import { ms, recordResult, summarize } from './stats';

const TARGET_MS = 50;
/** Runs after the first (cold) one before timing, so the JIT has settled. */
const WARM_UP = 10;

function option(name: string, env: string, fallback: number): number {
	const arg = process.argv.find((a) => a.startsWith(`--${name}=`));
	const n = Number(arg?.slice(name.length + 3) ?? process.env[env] ?? fallback);
	return Number.isInteger(n) && n > 0 ? n : fallback;
}

const runs = option('runs', 'BENCH_LANDED_RUNS', 50);
const lineCount = option('lines', 'BENCH_LANDED_LINES', 500);

const common = { ...courierCard({ currency: 'USD', distanceKm: '6600' }) };
const surcharges = [
	{ label: 'Fuel', basis: 'percent_of_freight' as const, amount: '18', currency: 'USD' },
	{ label: 'Security', basis: 'per_chargeable_kg' as const, amount: '0.15', currency: 'USD' }
];
const cards: Record<Exclude<TransportMode, 'courier'>, RateCard> = {
	air: {
		...common,
		mode: 'air',
		minimumCharge: '85.00',
		breaks: ['0:5.00', '45:4.20', '100:3.60', '300:3.10', '500:2.60', '1000:2.30'].map((b) => {
			const [fromKg, ratePerKg] = b.split(':') as [string, string];
			return { fromKg, ratePerKg };
		}),
		surcharges
	},
	sea_fcl: {
		...common,
		mode: 'sea_fcl',
		containerRates: [{ typeCode: '45G1', ratePerContainer: '2400.00' }],
		destinationCharges: [
			{ label: 'Terminal handling', basis: 'per_container', amount: '310', currency: 'AUD' }
		]
	},
	sea_lcl: { ...common, mode: 'sea_lcl', ratePerWm: '48.00', minimumWm: '1', minimumCharge: '60' },
	road: { ...common, mode: 'road', basis: 'per_pallet', rate: '95.00', minimumCharge: '150.00' }
};

function input(mode: TransportMode, card: RateCard): LandedCostInput {
	const hs = ['85182200', '85183000', '85171300', '85044090', '85076000'];
	return baseInput({
		mode,
		incoterm: 'FCA',
		goodsCurrency: 'USD',
		reportCurrency: 'AUD',
		allocation: 'weight',
		lines: Array.from({ length: lineCount }, (_, i) =>
			line({
				ref: String(i + 1),
				sku: `SKU-${i + 1}`,
				hsCode: hs[i % hs.length]!,
				quantity: 1 + (i % 37),
				unitPrice: `${10 + (i % 90)}.${String(i % 100).padStart(2, '0')}`,
				netKg: `${1 + (i % 9)}.250`,
				grossKg: `${2 + (i % 9)}.400`
			})
		),
		measures: {
			grossKg: '18400',
			volumeM3: '62.5',
			chargeableKg: mode === 'road' ? '20813' : '18400',
			pallets: 30,
			containers: [{ typeCode: '45G1', count: 1 }]
		},
		rateCard: card,
		tariffRows: [tariff('85', '5'), tariff('8518', '3'), tariff('851822', '2.5')],
		country: country({ fees: [] }),
		exchangeRates: [rate('AUD', 'USD', '0.65')],
		insurance: { ratePercent: '0.35', upliftPercent: '10', minimumPremium: null, source: 'bench' },
		brokerage: [{ label: 'Entry', basis: 'per_shipment', amount: '180.00', currency: 'AUD' }],
		carryingRatePercent: '8',
		emissionFactor: {
			id: 'ef',
			source: 'invented',
			validFrom: '2025-01-01',
			validTo: null,
			gCo2ePerTonneKm: '10'
		}
	});
}

const cpu = os.cpus()[0]?.model ?? 'unknown CPU';
console.log(`Landed-cost benchmark, ${new Date().toISOString().slice(0, 10)}`);
console.log(
	`Machine: ${cpu}, ${os.cpus().length} cores, Node ${process.version}, ${os.platform()}`
);
console.log(
	`Part A, in process: ${lineCount} lines, ${runs} runs per mode after ${WARM_UP + 1} warm-up runs`
);
console.log('');
console.log(
	'| Mode | First run | p50 | p95 | max | Target (p95) | Ratio | Verdict | Trail steps |'
);
console.log('| --- | --- | --- | --- | --- | --- | --- | --- | --- |');
for (const [mode, card] of Object.entries(cards) as [TransportMode, RateCard][]) {
	const data = input(mode, card);
	const t0 = performance.now();
	const first = landedCost(data);
	const coldMs = performance.now() - t0;
	if (!first.ok) throw new Error(`${mode}: ${JSON.stringify(first.missing)}`);
	for (let i = 0; i < WARM_UP; i++) landedCost(data);
	const samples: number[] = [];
	for (let i = 0; i < runs; i++) {
		const start = performance.now();
		landedCost(data);
		samples.push(performance.now() - start);
	}
	const s = summarize(samples);
	const { ratio, verdict } = recordResult(
		`landed cost ${mode}, ${lineCount} lines`,
		TARGET_MS,
		s,
		`${runs} runs after ${WARM_UP + 1} warm-up runs, one process`
	);
	console.log(
		`| ${mode} | ${ms(coldMs)} | ${ms(s.p50)} | ${ms(s.p95)} | ${ms(s.max)} | ${TARGET_MS} ms | ${ratio.toFixed(2)} | ${verdict} | ${first.trail.length} |`
	);
}
process.exit(0);
