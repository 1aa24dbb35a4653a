// npm run bench:docs — the commercial invoice PDF of 300 lines (the test fixture), rendered N
// times after a warm-up. Prints p50/p95/max against the 1,500 ms target, the page count and the
// file size. A benchmark, not a test: it prints figures and never fails CI.
//
// Options (argument or environment variable):
//   --runs=N     BENCH_DOCS_RUNS   default 20
//   --lines=N    BENCH_DOCS_LINES  default 300
import os from 'node:os';
import { performance } from 'node:perf_hooks';
import { invoiceFixture } from '../../src/lib/server/documents/pdf/fixtures';
import { renderInvoicePdf } from '../../src/lib/server/documents/pdf/invoice-pdf';
import { ms, recordResult, summarize } from './stats';

const TARGET_MS = 1500;

function option(name: string, env: string, fallback: number): number {
	const arg = process.argv.find((a) => a.startsWith(`--${name}=`));
	const n = Number(arg?.slice(name.length + 3) ?? process.env[env] ?? fallback);
	return Number.isInteger(n) && n > 0 ? n : fallback;
}

const runs = option('runs', 'BENCH_DOCS_RUNS', 20);
const lines = option('lines', 'BENCH_DOCS_LINES', 300);

const cpu = os.cpus()[0]?.model ?? 'unknown CPU';
console.log(`Customs papers benchmark, ${new Date().toISOString().slice(0, 10)}`);
console.log(
	`Machine: ${cpu}, ${os.cpus().length} cores, Node ${process.version}, ${os.platform()}`
);
console.log(`Commercial invoice, ${lines} lines (fixture), ${runs} runs after one warm-up`);
console.log('');

const snapshot = invoiceFixture({ lines });
const t0 = performance.now();
const warm = await renderInvoicePdf(snapshot);
const coldMs = performance.now() - t0;

const samples: number[] = [];
for (let i = 0; i < runs; i++) {
	const start = performance.now();
	await renderInvoicePdf(snapshot);
	samples.push(performance.now() - start);
}
const s = summarize(samples);
const { ratio, verdict } = recordResult(
	`invoice PDF, ${lines} lines`,
	TARGET_MS,
	s,
	`${runs} runs after warm-up, one process`
);
console.log(`| Figure | Value |`);
console.log(`| --- | --- |`);
console.log(`| First render (cold: font and modules) | ${ms(coldMs)} |`);
console.log(`| p50 | ${ms(s.p50)} |`);
console.log(`| p95 | ${ms(s.p95)} |`);
console.log(`| max | ${ms(s.max)} |`);
console.log(`| Target (p95) | ${TARGET_MS} ms |`);
console.log(`| Ratio p95 / target | ${ratio.toFixed(2)} |`);
console.log(`| Verdict | ${verdict} |`);
console.log(`| Pages | ${warm.pages} |`);
console.log(`| PDF size | ${(warm.pdf.length / 1024).toFixed(1)} KiB |`);
process.exit(0);
