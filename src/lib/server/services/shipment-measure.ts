import { measure } from '../../packing';
import { measureInputFrom } from '../../packing-input';
import type { SessionUser } from '../auth/session-user';
import { PalletTypeRow } from '../db/models';
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
