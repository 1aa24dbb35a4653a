import { QueryTypes } from 'sequelize';
import { measure } from '../../packing';
import { measureInputFrom } from '../../packing-input';
import type { LotInput, LotRowInput } from '../../schemas/shipments';
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

type LotProblem = { field: 'productId' | 'cartonTo'; message: string };

/** Why this lot cannot be recorded on a shipment whose product carton ranges are `ranges`. */
function lotProblem(
	lot: LotRowInput,
	ranges: Map<string, (readonly [number, number])[]>
): LotProblem | null {
	const own = ranges.get(lot.productId) ?? [];
	if (own.length === 0)
		return { field: 'productId', message: 'This product is not on the shipment.' };
	if (own.some(([from, to]) => lot.cartonFrom >= from && lot.cartonTo <= to)) return null;
	const text = own.map(([from, to]) => `${from}–${to}`).join(', ');
	return { field: 'cartonTo', message: `This product is in cartons ${text}.` };
}

/**
 * Records lots in carton ranges, all or none; each range must lie within the cartons of that
 * product's lines. One lot (the typed form) gets field errors; several (a CSV file) a message
 * naming the rows.
 */
export async function addLots(
	actor: SessionUser,
	shipmentId: string,
	lots: LotRowInput[],
	version: number,
	ip: string | null
): Promise<ServiceResult<{ ids: string[] }>> {
	if (!canEditShipments(actor))
		return fail(403, 'Only coordinators and administrators record lots.');
	const shipment = await getShipment(actor, shipmentId);
	if (!shipment) return fail(404, 'No shipment with this id is visible to you.');
	if (shipment.version !== version)
		return fail(409, 'Someone else changed this shipment. Reload and try again.');
	const products = await productsBySku(shipment.lines.map((l) => l.sku));
	const result = measure(measureInputFrom([...products.values()], shipment.lines, null));
	if (!result.ok) return fail(400, 'Measure the lines first: some products have no packaging.');
	const ranges = new Map<string, (readonly [number, number])[]>();
	for (const line of result.lines) {
		const productId = shipment.lines[line.lineIndex]?.productId;
		if (!productId) continue;
		ranges.set(productId, [...(ranges.get(productId) ?? []), [line.firstCarton, line.lastCarton]]);
	}
	const problems = lots.map((lot) => lotProblem(lot, ranges));
	const first = problems.find((p) => p !== null);
	if (first) {
		if (lots.length === 1) {
			return fail(400, 'Check the highlighted fields.', { [first.field]: first.message });
		}
		const rows = problems
			.map((p, i) => (p ? `row ${i + 2} (lot ${lots[i]!.lotNumber}): ${p.message}` : null))
			.filter((text): text is string => text !== null);
		const more = rows.length > 5 ? ` And ${rows.length - 5} more.` : '';
		return fail(
			400,
			`Nothing was added: ${rows.length} of ${lots.length} lots do not fit this shipment — ` +
				`${rows.slice(0, 5).join('; ')}.${more}`
		);
	}
	const ids = await Shipment.sequelize!.transaction(async (transaction) => {
		const added: string[] = [];
		for (const lot of lots) {
			const [row] = await Shipment.sequelize!.query<{ id: string }>(
				`INSERT INTO shipment_lots (shipment_id, product_id, carton_from, carton_to, lot_number, serial_from, serial_to, created_by)
				 VALUES (:shipmentId, :productId, :cartonFrom, :cartonTo, :lotNumber, :serialFrom, :serialTo, :actor) RETURNING id`,
				{
					type: QueryTypes.SELECT,
					transaction,
					replacements: {
						shipmentId,
						productId: lot.productId,
						cartonFrom: lot.cartonFrom,
						cartonTo: lot.cartonTo,
						lotNumber: lot.lotNumber,
						serialFrom: lot.serialFrom || null,
						serialTo: lot.serialTo || null,
						actor: actor.id
					}
				}
			);
			added.push(row!.id);
		}
		await recordAudit(
			{
				actorUserId: actor.id,
				action: lots.length === 1 ? 'shipment.lot_add' : 'shipment.lot_import',
				entity: 'shipment',
				entityId: shipmentId,
				after: lots.length === 1 ? { ...lots[0] } : { lots: lots.length, lotIds: added },
				ip
			},
			transaction
		);
		return added;
	});
	return { ok: true, value: { ids } };
}

/** Records one lot (the typed form); see addLots. */
export async function addLot(
	actor: SessionUser,
	shipmentId: string,
	input: LotInput,
	ip: string | null
): Promise<ServiceResult<{ id: string }>> {
	const { version, ...lot } = input;
	const result = await addLots(actor, shipmentId, [lot], version, ip);
	return result.ok ? { ok: true, value: { id: result.value.ids[0]! } } : result;
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
