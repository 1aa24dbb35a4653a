/**
 * The load plan of a stored shipment: its measured cartons (or pallets) and every container type,
 * planned in a worker thread and cached per shipment revision and planner input. Scoped like the
 * shipment itself (the stamp query of kept-results.ts). The planner input is kept in memory per
 * stamp, so a GET of a stored plan costs two small queries.
 */
import { createHash } from 'node:crypto';
import {
	DEFAULT_TIME_BUDGET_MS,
	type LoadPlan,
	type LoadPlanInput,
	type LoadPlanProgress
} from '../../load-plan';
import {
	shipmentLoadInput,
	type CartonHandling,
	type ShipmentLoadPlanView
} from '../../load-plan-input';
import type { Problem } from '../../packing';
import type { SessionUser } from '../auth/session-user';
import { ContainerTypeRow, ShipmentLoadPlan } from '../db/models';
import { planOf } from '../load-plan/run-result';
import { runLoadPlan } from '../load-plan/runner';
import { KeptResults } from './kept-results';
import { keptShipmentMeasure, type ShipmentMeasure } from './shipment-measure';

/** Bump when the stored plan's meaning changes, so older rows are computed afresh. */
const CACHE_FORMAT = 1;

export type { ShipmentLoadPlanView };

export type LoadPlanRefusal = {
	ok: false;
	status: 404 | 409 | 503;
	code: string;
	message: string;
	issues: Problem[];
};
export type LoadPlanOutcome = { ok: true; value: ShipmentLoadPlanView } | LoadPlanRefusal;

function refusal(
	status: LoadPlanRefusal['status'],
	code: string,
	message: string,
	issues: Problem[] = []
): LoadPlanRefusal {
	return { ok: false, status, code, message, issues };
}

export interface Prepared {
	shipment: { id: string; reference: string; version: number };
	input: LoadPlanInput;
	hash: string;
	view: Omit<ShipmentLoadPlanView, 'computedAt' | 'cached' | 'plan'>;
}

/** Prepared inputs of the shipments being looked at, per stamp. */
const keptPrepared = new KeptResults<Prepared>(100);

/** The shipment's planner input and cache key, or why it cannot be planned (404, 409). */
export async function prepareLoadPlan(
	user: SessionUser,
	id: string
): Promise<Prepared | LoadPlanRefusal> {
	const kept = await keptShipmentMeasure(user, id);
	if (!kept) return refusal(404, 'not_found', 'No shipment with this id is visible to you.');
	const hit = keptPrepared.get(id, kept.stamp);
	if (hit) return hit;
	const prepared = await prepare(kept.measure);
	// Refusals are not kept: they are cheap, and say what to fix.
	if (!('ok' in prepared)) keptPrepared.keep(id, kept.stamp, prepared);
	return prepared;
}

async function prepare({
	shipment,
	input: measureInput,
	result
}: ShipmentMeasure): Promise<Prepared | LoadPlanRefusal> {
	if (shipment.lineCount === 0) {
		return refusal(409, 'no_lines', 'Add lines to the shipment before planning its load.');
	}
	if (!result.ok) {
		return refusal(
			409,
			'not_measurable',
			'The shipment’s cartons cannot be measured yet; correct its lines or products first.',
			result.problems
		);
	}
	const types = await ContainerTypeRow.findAll({ order: [['code', 'ASC']], raw: true });
	if (types.length === 0) {
		return refusal(409, 'no_container_types', 'No container types are recorded to plan into.');
	}
	const handling = new Map<string, CartonHandling>();
	for (const p of measureInput.products) if (p.packaging) handling.set(p.sku, p.packaging);
	const load = shipmentLoadInput(result, handling, types);
	const input: LoadPlanInput = {
		items: load.items,
		containers: load.containers,
		options: { timeBudgetMs: DEFAULT_TIME_BUDGET_MS }
	};
	const hash = createHash('sha256')
		.update(JSON.stringify({ format: CACHE_FORMAT, input }))
		.digest('hex');
	return {
		shipment: { id: shipment.id, reference: shipment.reference, version: shipment.version },
		input,
		hash,
		view: {
			shipmentId: shipment.id,
			reference: shipment.reference,
			version: shipment.version,
			items: load.items,
			info: load.info,
			containerTypes: load.containers.map((c) => ({ ...c, name: load.containerNames[c.id]! }))
		}
	};
}

async function readCache(p: Prepared): Promise<ShipmentLoadPlanView | null> {
	const row = await ShipmentLoadPlan.findOne({
		where: { shipmentId: p.shipment.id, shipmentVersion: p.shipment.version, inputHash: p.hash }
	});
	if (!row) return null;
	return {
		...p.view,
		computedAt: row.createdAt.toISOString(),
		cached: true,
		plan: row.plan as LoadPlan
	};
}

/** The cached plan of the shipment's current revision, or null; never computes. */
export async function cachedLoadPlan(
	user: SessionUser,
	id: string
): Promise<ShipmentLoadPlanView | null> {
	const p = await prepareLoadPlan(user, id);
	return 'ok' in p ? null : readCache(p);
}

type Running = { promise: Promise<LoadPlanOutcome>; listeners: Set<(p: LoadPlanProgress) => void> };
/** Plans being computed in this process, by shipment and input: a second request joins them. */
const running = new Map<string, Running>();

async function compute(p: Prepared, listeners: Running['listeners']): Promise<LoadPlanOutcome> {
	const outcome = await runLoadPlan(p.input, (progress) => {
		for (const listener of listeners) listener(progress);
	});
	if (!outcome.ok) {
		return refusal(503, `planner_${outcome.code}`, outcome.message);
	}
	if (!outcome.result.ok) {
		return refusal(
			409,
			'not_plannable',
			'This shipment cannot be planned as it stands.',
			outcome.result.problems
		);
	}
	const plan = planOf(outcome.result);
	const [row] = await ShipmentLoadPlan.upsert({
		shipmentId: p.shipment.id,
		shipmentVersion: p.shipment.version,
		inputHash: p.hash,
		plan,
		createdAt: new Date()
	});
	return {
		ok: true,
		value: { ...p.view, computedAt: row.createdAt.toISOString(), cached: false, plan }
	};
}

/**
 * The plan of the shipment's current revision: from the cache when it was made for this revision
 * and input, else computed (in a worker) and stored. `onProgress` hears the search's progress.
 */
export async function shipmentLoadPlan(
	user: SessionUser,
	id: string,
	onProgress?: (progress: LoadPlanProgress) => void
): Promise<LoadPlanOutcome> {
	const p = await prepareLoadPlan(user, id);
	return 'ok' in p ? p : planPrepared(p, onProgress);
}

/** As shipmentLoadPlan, for a shipment already prepared (the streaming route checks first). */
export async function planPrepared(
	p: Prepared,
	onProgress?: (progress: LoadPlanProgress) => void
): Promise<LoadPlanOutcome> {
	const cached = await readCache(p);
	if (cached) return { ok: true, value: cached };
	const key = `${p.shipment.id}:${p.shipment.version}:${p.hash}`;
	let job = running.get(key);
	if (!job) {
		const listeners: Running['listeners'] = new Set();
		const promise = compute(p, listeners).finally(() => running.delete(key));
		job = { promise, listeners };
		running.set(key, job);
	}
	if (onProgress) job.listeners.add(onProgress);
	try {
		return await job.promise;
	} finally {
		if (onProgress) job.listeners.delete(onProgress);
	}
}
