import { QueryTypes } from 'sequelize';
import { measure } from '../../packing';
import { measureInputFrom } from '../../packing-input';
import type { LotInput } from '../../schemas/shipments';
import type { SessionUser } from '../auth/session-user';
import { Shipment } from '../db/models';
import { recordAudit } from './audit';
import { productsBySku } from './products';
import { getShipment } from './shipment-detail';
import { canEditShipments, shipmentScopeSql } from './shipment-scope';
import { refused as fail, type ServiceResult } from './result';

export interface LotRow {
	id: string;
	sku: string;
	cartonFrom: number;
	cartonTo: number;
	lotNumber: string;
	serialFrom: string | null;
	serialTo: string | null;
}

export async function listLots(shipmentId: string): Promise<LotRow[]> {
	return Shipment.sequelize!.query<LotRow>(
		`SELECT l.id, p.sku, l.carton_from AS "cartonFrom", l.carton_to AS "cartonTo", l.lot_number AS "lotNumber",
		        l.serial_from AS "serialFrom", l.serial_to AS "serialTo"
		   FROM shipment_lots l JOIN products p ON p.id = l.product_id
		  WHERE l.shipment_id = :shipmentId ORDER BY l.carton_from, l.lot_number`,
		{ type: QueryTypes.SELECT, replacements: { shipmentId } }
	);
}

/** Records a lot in a carton range; the range must lie within the cartons of that product's lines. */
export async function addLot(
	actor: SessionUser,
	shipmentId: string,
	input: LotInput,
	ip: string | null
): Promise<ServiceResult<{ id: string }>> {
	if (!canEditShipments(actor))
		return fail(403, 'Only coordinators and administrators record lots.');
	const shipment = await getShipment(actor, shipmentId);
	if (!shipment) return fail(404, 'No shipment with this id is visible to you.');
	if (shipment.version !== input.version)
		return fail(409, 'Someone else changed this shipment. Reload and try again.');
	const products = await productsBySku(shipment.lines.map((l) => l.sku));
	const result = measure(measureInputFrom([...products.values()], shipment.lines, null));
	if (!result.ok) return fail(400, 'Measure the lines first: some products have no packaging.');
	const ranges = result.lines
		.filter((line) => shipment.lines[line.lineIndex]?.productId === input.productId)
		.map((line) => [line.firstCarton, line.lastCarton] as const);
	if (ranges.length === 0)
		return fail(400, 'Check the highlighted fields.', {
			productId: 'This product is not on the shipment.'
		});
	const inside = ranges.some(([from, to]) => input.cartonFrom >= from && input.cartonTo <= to);
	if (!inside) {
		const text = ranges.map(([from, to]) => `${from}–${to}`).join(', ');
		return fail(400, 'Check the highlighted fields.', {
			cartonTo: `This product is in cartons ${text}.`
		});
	}
	const id = await Shipment.sequelize!.transaction(async (transaction) => {
		const [row] = await Shipment.sequelize!.query<{ id: string }>(
			`INSERT INTO shipment_lots (shipment_id, product_id, carton_from, carton_to, lot_number, serial_from, serial_to, created_by)
			 VALUES (:shipmentId, :productId, :cartonFrom, :cartonTo, :lotNumber, :serialFrom, :serialTo, :actor) RETURNING id`,
			{
				type: QueryTypes.SELECT,
				transaction,
				replacements: {
					shipmentId,
					productId: input.productId,
					cartonFrom: input.cartonFrom,
					cartonTo: input.cartonTo,
					lotNumber: input.lotNumber,
					serialFrom: input.serialFrom || null,
					serialTo: input.serialTo || null,
					actor: actor.id
				}
			}
		);
		await recordAudit(
			{
				actorUserId: actor.id,
				action: 'shipment.lot_add',
				entity: 'shipment',
				entityId: shipmentId,
				after: { ...input },
				ip
			},
			transaction
		);
		return row!.id;
	});
	return { ok: true, value: { id } };
}

export async function removeLot(
	actor: SessionUser,
	shipmentId: string,
	lotId: string,
	ip: string | null
): Promise<ServiceResult<{ id: string }>> {
	if (!canEditShipments(actor))
		return fail(403, 'Only coordinators and administrators change lots.');
	const deleted = await Shipment.sequelize!.query<{ id: string }>(
		'DELETE FROM shipment_lots WHERE id = :lotId AND shipment_id = :shipmentId RETURNING id',
		{ type: QueryTypes.SELECT, replacements: { lotId, shipmentId } }
	);
	if (deleted.length === 0) return fail(404, 'No such lot on this shipment.');
	await recordAudit({
		actorUserId: actor.id,
		action: 'shipment.lot_remove',
		entity: 'shipment',
		entityId: shipmentId,
		before: { lotId },
		ip
	});
	return { ok: true, value: { id: lotId } };
}

export interface SerialHit {
	shipmentId: string;
	reference: string;
	customerName: string;
	status: string;
	etd: string | null;
	sku: string;
	lotNumber: string;
	cartonFrom: number;
	cartonTo: number;
	serialFrom: string | null;
	serialTo: string | null;
}

/** "Where did serial X (or lot X) go?": every shipment, carton range and customer it was packed for. */
export async function traceSerial(user: SessionUser, query: string): Promise<SerialHit[]> {
	const scope = shipmentScopeSql(user);
	return Shipment.sequelize!.query<SerialHit>(
		`SELECT s.id AS "shipmentId", s.reference, c.name AS "customerName", s.status, s.etd, p.sku,
		        l.lot_number AS "lotNumber", l.carton_from AS "cartonFrom", l.carton_to AS "cartonTo",
		        l.serial_from AS "serialFrom", l.serial_to AS "serialTo"
		   FROM shipment_lots l
		   JOIN shipments s ON s.id = l.shipment_id
		   JOIN organizations c ON c.id = s.customer_id
		   JOIN products p ON p.id = l.product_id
		  WHERE ${scope.sql}
		    AND ((length(l.serial_from) = length(:q) AND :q BETWEEN l.serial_from AND l.serial_to)
		         OR lower(l.lot_number) = lower(:q))
		  ORDER BY s.etd DESC NULLS LAST, s.reference
		  LIMIT 100`,
		{ type: QueryTypes.SELECT, replacements: { ...scope.replacements, q: query } }
	);
}
