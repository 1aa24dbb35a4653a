import { measure, type MeasureResult } from '../../packing';
import { measureInputFrom } from '../../packing-input';
import type { MeasureInput } from '../../packing/schema';
import type { SessionUser } from '../auth/session-user';
import { PalletTypeRow } from '../db/models';
import { KeptResults, shipmentStamp } from './kept-results';
import { productsBySku } from './products';
import { getShipment } from './shipment-detail';

/** Measures a stored shipment: its lines, their products' packaging, its pallet type. */
export async function measureShipment(user: SessionUser, id: string) {
	const shipment = await getShipment(user, id);
	if (!shipment) return null;
	const products = await productsBySku(shipment.lines.map((l) => l.sku));
	const pallet = shipment.palletTypeId
		? await PalletTypeRow.findByPk(shipment.palletTypeId, { raw: true })
		: null;
	const input = measureInputFrom([...products.values()], shipment.lines, pallet);
	return { shipment, input, result: measure(input) };
}

/** The measure without the page's data: what the measure API and the load planner need. */
export interface ShipmentMeasure {
	shipment: { id: string; reference: string; version: number; lineCount: number };
	input: MeasureInput;
	result: MeasureResult;
}

/** One per shipment being looked at; a 500-line result on pallets is about 1 MB. */
const kept = new KeptResults<ShipmentMeasure>(100);

/**
 * The shipment's measure, kept per stamp (kept-results.ts), with that stamp for callers that keep
 * what they derive from it; null when the user may not see the shipment. Callers must not mutate
 * what it returns.
 */
export async function keptShipmentMeasure(
	user: SessionUser,
	id: string
): Promise<{ stamp: string; measure: ShipmentMeasure } | null> {
	const stamp = await shipmentStamp(user, id);
	if (stamp === null) return null;
	const hit = kept.get(id, stamp);
	if (hit) return { stamp, measure: hit };
	const measured = await measureShipment(user, id);
	if (!measured) return null;
	const { shipment: s, input, result } = measured;
	const value: ShipmentMeasure = {
		shipment: { id: s.id, reference: s.reference, version: s.version, lineCount: s.lines.length },
		input,
		result
	};
	kept.keep(id, stamp, value);
	return { stamp, measure: value };
}
