/**
 * Landed cost of a stored shipment for one mode: the engine's input gathered from the database,
 * then the pure engine. What is missing (rate card, tariff row, exchange rate…) comes back as a
 * list, never as a figure computed with a zero. Results are kept per shipment stamp
 * (kept-results.ts): unchanged data is not gathered and computed twice.
 */
import { landedCost, type LandedCostInput, type LandedCostResult } from '../../../landed-cost';
import type { TransportMode } from '../../../landed-cost/types';
import { isStaff } from '../../../roles';
import type { SessionUser } from '../../auth/session-user';
import { shipmentLandedCostInput, type InputOptions } from './input';
import { KeptResults, shipmentStamp } from '../kept-results';

export type ShipmentLandedCost =
	| { ok: true; reference: string; input: LandedCostInput; result: LandedCostResult }
	| { ok: false; status: 404 | 409; message: string; missing: { path: string; message: string }[] };

/** Enough for every shipment finance is comparing at once. */
const kept = new KeptResults<ShipmentLandedCost>(200);

const notVisible = (): ShipmentLandedCost => ({
	ok: false,
	status: 404,
	message: 'No shipment with this id is visible to you.',
	missing: []
});

export async function shipmentLandedCost(
	user: SessionUser,
	shipmentId: string,
	mode: TransportMode,
	options: InputOptions = {}
): Promise<ShipmentLandedCost> {
	// Staff only: the figures hold internal costs and margins (routes check the role too).
	if (!isStaff(user.role)) return notVisible();
	const stamp = await shipmentStamp(user, shipmentId);
	if (stamp === null) return notVisible();
	// The date is part of the key: "today" moves, and the rows valid on it with it.
	const date = options.date ?? new Date().toISOString().slice(0, 10);
	const key = JSON.stringify([
		shipmentId,
		mode,
		date,
		options.allocation ?? null,
		options.preferenceClaimed ?? null,
		options.carryingRatePercent ?? null,
		options.reportCurrency ?? null
	]);
	const hit = kept.get(key, stamp);
	if (hit) return hit;
	const outcome = await compute(user, shipmentId, mode, { ...options, date });
	// Refusals are not kept: some are passing (the load planner busy), and they are cheap.
	if (outcome.ok) kept.keep(key, stamp, outcome);
	return outcome;
}

async function compute(
	user: SessionUser,
	shipmentId: string,
	mode: TransportMode,
	options: InputOptions
): Promise<ShipmentLandedCost> {
	const gathered = await shipmentLandedCostInput(user, shipmentId, mode, options);
	if (!gathered.ok) return gathered;
	return {
		ok: true,
		reference: gathered.reference,
		input: gathered.input,
		result: landedCost(gathered.input)
	};
}
