/**
 * Runs planLoad in worker threads, so a search of a few seconds never blocks the requests of
 * others. Two lanes on a machine with two cores or more: the first takes any job, the second only
 * short searches (QUICK_BUDGET_MS or less), so small "what if" plans do not queue behind each
 * other or behind a long search, while long searches never hold more than one core (the others
 * serve the requests). Later jobs wait in a queue bounded by the search time they ask for. Workers
 * are kept between jobs (starting one and compiling the planner cost about 100 ms, more than a
 * small plan) and stopped after a minute idle. A worker that crashes, runs out of memory or
 * overruns its time is stopped and reported as a plain refusal, never as an exception with a
 * stack; the next job gets a new one.
 */
import { availableParallelism } from 'node:os';
import { Worker } from 'node:worker_threads';
import { DEFAULT_TIME_BUDGET_MS, type LoadPlanInput, type LoadPlanProgress } from '../../load-plan';
import type { RunResult } from './run-result';

/** Same as worker.ts's JOB_TAG (not imported: that would pull the worker into this chunk). */
const JOB_TAG = 'landfall-load-plan';

export type RunOutcome =
	| { ok: true; result: RunResult }
	| { ok: false; code: 'busy' | 'timeout' | 'crashed'; message: string };

/**
 * Search time the waiting (not started) jobs may ask for in all, ms; a job beyond it is refused (the server is
 * busy). Eight searches of the default 3 s, or many more small ones.
 */
export const MAX_QUEUED_BUDGET_MS = 8 * DEFAULT_TIME_BUDGET_MS;
/** Waiting jobs, whatever their budgets: each holds its input in memory. */
export const MAX_QUEUED = 64;
/** Time the worker may take beyond the planner's own budget (start-up, dressing the plan). */
const GRACE_MS = 15_000;
const MEMORY_MB = 512;
/** A worker idle this long is stopped, giving its memory back. */
const IDLE_MS = 60_000;

/** Jobs whose search budget is at most this may run in the second lane. */
export const QUICK_BUDGET_MS = 500;
/** Largest budget each lane takes: one general lane, and a quick one where there is a core for it. */
const LANES: number[] = availableParallelism() >= 2 ? [Infinity, QUICK_BUDGET_MS] : [Infinity];

interface Job {
	budget: number;
	start: () => Promise<void>;
}
/** Jobs not started yet, oldest first. */
const queue: Job[] = [];
const laneBusy: boolean[] = LANES.map(() => false);
let waitingBudgetMs = 0;
/** Workers kept from jobs that finished well, each with its idle timer. */
const idle: { worker: Worker; timer: NodeJS.Timeout }[] = [];

async function workerUrl(): Promise<URL> {
	// A dynamic import keeps the worker module in a chunk of its own in the server build.
	const { WORKER_URL } = await import('./worker');
	return new URL(WORKER_URL);
}

function startWorker(url: URL): Worker {
	const resourceLimits = { maxOldGenerationSizeMb: MEMORY_MB };
	const workerData = { tag: JOB_TAG };
	let worker: Worker;
	if (!url.pathname.endsWith('.ts')) worker = new Worker(url, { workerData, resourceLimits });
	else {
		// Under vite dev and vitest the module is still TypeScript: tsx (a dev dependency, resolved
		// from the project root, the working directory there) loads it.
		const boot = `import('tsx/esm/api').then((m) => { m.register(); return import(${JSON.stringify(url.href)}); })`;
		worker = new Worker(boot, { eval: true, workerData, resourceLimits });
	}
	// A kept worker that dies while idle is simply not used again.
	worker.on('error', () => {});
	worker.once('exit', () => {
		const i = idle.findIndex((kept) => kept.worker === worker);
		if (i >= 0) {
			clearTimeout(idle[i]!.timer);
			idle.splice(i, 1);
		}
	});
	return worker;
}

/** The kept worker, or a new one. */
function takeWorker(url: URL): Worker {
	const kept = idle.pop();
	if (!kept) return startWorker(url);
	const { worker, timer } = kept;
	clearTimeout(timer);
	worker.ref();
	return worker;
}

/** Keeps a worker that finished its job well for the next one; it never holds the process open. */
function keepWorker(worker: Worker): void {
	worker.unref();
	const timer = setTimeout(() => void worker.terminate(), IDLE_MS);
	timer.unref();
	idle.push({ worker, timer });
}

function runOnce(
	input: LoadPlanInput,
	onProgress: (p: LoadPlanProgress) => void,
	url: URL,
	graceMs: number
): Promise<RunOutcome> {
	const budget = input.options?.timeBudgetMs ?? DEFAULT_TIME_BUDGET_MS;
	return new Promise((resolve) => {
		let settled = false;
		const worker = takeWorker(url);
		const finish = (outcome: RunOutcome, keep = false) => {
			if (settled) return;
			settled = true;
			clearTimeout(timer);
			worker.off('message', onMessage);
			worker.off('error', onError);
			worker.off('exit', onExit);
			if (keep) keepWorker(worker);
			else void worker.terminate();
			resolve(outcome);
		};
		const onMessage = (m: import('./worker').WorkerMessage) => {
			if (m.type === 'progress') onProgress(m.progress);
			else finish({ ok: true, result: m.result }, true);
		};
		const onError = (e: Error) =>
			finish({
				ok: false,
				code: 'crashed',
				message: `The load planner stopped unexpectedly (${e.name}${/memory/i.test(e.message) ? ': out of memory' : ''}). Try again, or plan fewer pieces.`
			});
		const onExit = (code: number) =>
			finish({
				ok: false,
				code: 'crashed',
				message: `The load planner stopped unexpectedly (exit code ${code}). Try again.`
			});
		const timer = setTimeout(
			() =>
				finish({
					ok: false,
					code: 'timeout',
					message: `The load planner did not finish within ${Math.round((budget + graceMs) / 1000)} s and was stopped. Try again, or plan fewer pieces.`
				}),
			budget + graceMs
		);
		worker.on('message', onMessage);
		worker.on('error', onError);
		worker.on('exit', onExit);
		try {
			worker.postMessage({ type: 'job', input } satisfies import('./worker').WorkerJob);
		} catch (e) {
			// An input that cannot be copied to the worker (a function, say).
			finish({
				ok: false,
				code: 'crashed',
				message: `The load planner could not start (${(e as Error).name}).`
			});
		}
	});
}

/** Starts queued jobs on the free lanes: the oldest job a lane takes goes first. */
function dispatch(): void {
	LANES.forEach((maxBudget, lane) => {
		if (laneBusy[lane]) return;
		const i = queue.findIndex((job) => job.budget <= maxBudget);
		if (i < 0) return;
		const [job] = queue.splice(i, 1);
		waitingBudgetMs -= job!.budget;
		laneBusy[lane] = true;
		void job!.start().finally(() => {
			laneBusy[lane] = false;
			dispatch();
		});
	});
}

/** Plans `input` in a worker once a lane that takes it is free. */
export function runLoadPlan(
	input: LoadPlanInput,
	onProgress: (p: LoadPlanProgress) => void = () => {},
	{ graceMs = GRACE_MS }: { graceMs?: number } = {}
): Promise<RunOutcome> {
	const budget = input.options?.timeBudgetMs ?? DEFAULT_TIME_BUDGET_MS;
	const waiting = queue.length;
	// The first to wait is always admitted, whatever it asks for; more wait while their budgets fit.
	if (waiting > 0 && (waiting >= MAX_QUEUED || waitingBudgetMs + budget > MAX_QUEUED_BUDGET_MS)) {
		return Promise.resolve({
			ok: false,
			code: 'busy',
			message: 'The load planner is busy with other plans. Try again in a minute.'
		});
	}
	return new Promise((resolve) => {
		const start = async () => {
			try {
				resolve(await runOnce(input, onProgress, await workerUrl(), graceMs));
			} catch (e) {
				resolve({
					ok: false,
					code: 'crashed',
					message: `The load planner could not start (${(e as Error).name}).`
				});
			}
		};
		queue.push({ budget, start });
		waitingBudgetMs += budget;
		// Jobs asked for in the same tick queue together before any starts (the queue's bound
		// applies to them all, as to jobs that arrive while the lanes are busy).
		queueMicrotask(dispatch);
	});
}
