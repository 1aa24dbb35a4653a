/**
 * Landed cost of a stored shipment for one mode: the engine's input gathered from the database,
 * then the pure engine. What is missing (rate card, tariff row, exchange rate…) comes back as a
 * list, never as a figure computed with a zero.
 */
import { landedCost, type LandedCostInput, type LandedCostResult } from '../../../landed-cost';
import type { TransportMode } from '../../../landed-cost/types';
import type { SessionUser } from '../../auth/session-user';
import { shipmentLandedCostInput, type InputOptions } from './input';

export type ShipmentLandedCost =
	| { ok: true; reference: string; input: LandedCostInput; result: LandedCostResult }
	| { ok: false; status: 404 | 409; message: string; missing: { path: string; message: string }[] };

export async function shipmentLandedCost(
	user: SessionUser,
	shipmentId: string,
	mode: TransportMode,
	options: InputOptions = {}
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
