import Decimal from 'decimal.js';
import { Op, QueryTypes, type Transaction } from 'sequelize';
import type { PaperDetailsInput } from '../../schemas/documents';
import type { ShipmentInput, ShipmentLinesInput } from '../../schemas/shipments';
import { canTransition, type ShipmentStatus } from '../../trade/shipment-status';
import type { SessionUser } from '../auth/session-user';
import {
	ContainerTypeRow,
	Organization,
	PalletTypeRow,
	Party,
	Place,
	Product,
	Shipment,
	ShipmentContainer,
	ShipmentLine,
	ShipmentStatusEvent
} from '../db/models';
import { recordAudit } from './audit';
import { shipmentBooked } from './shipment-notices';
import { papersOutOfDate } from './documents/issue';
import { canEditShipments, shipmentScopeWhere } from './shipment-scope';
import { refused as refusal, type Refusal, type ServiceResult } from './result';

/** Header and lines may change only before the papers are issued. */
export const EDITABLE_STATUSES: readonly ShipmentStatus[] = ['draft', 'booked'];

const CONFLICT = refusal(
	409,
	'Someone else changed this shipment while you were editing. Reload to see their change, then apply yours again.'
);
const NOT_FOUND = refusal(404, 'No shipment with this id is visible to you.');

class Refused extends Error {
	constructor(readonly result: Refusal) {
		super(result.message);
	}
}

/** Optimistic lock: bumps the version only if it is still the one the editor saw. */
async function bumpVersion(transaction: Transaction, id: string, expected: number): Promise<void> {
	const [, affected] = await Shipment.sequelize!.query(
		'UPDATE shipments SET version = version + 1, updated_at = now() WHERE id = :id AND version = :expected',
		{ replacements: { id, expected }, transaction, type: QueryTypes.UPDATE }
	);
	if (affected !== 1) throw new Refused(CONFLICT);
}

/** Next gap-free reference for the exporter and year, e.g. SHP-2026-00042 (row-locked counter). */
async function nextReference(transaction: Transaction, exporterId: string, year: number) {
	const [row] = await Shipment.sequelize!.query<{ last_value: number }>(
		`INSERT INTO shipment_reference_counters (exporter_id, year, last_value) VALUES (:exporterId, :year, 1)
		 ON CONFLICT (exporter_id, year) DO UPDATE SET last_value = shipment_reference_counters.last_value + 1
		 RETURNING last_value`,
		{ replacements: { exporterId, year }, transaction, type: QueryTypes.SELECT }
	);
	return `SHP-${year}-${String(row!.last_value).padStart(5, '0')}`;
}

/**
 * Checks that every id in the header points at a row of the right kind. A retired place or party
 * is accepted only where the shipment already names it (`current`).
 */
async function checkReferences(
	input: ShipmentInput,
	transaction: Transaction,
	current?: Shipment
): Promise<Record<string, string>> {
	const errors: Record<string, string> = {};
	const customer = await Organization.findByPk(input.customerId, { transaction });
	if (!customer || customer.kind !== 'customer')
		errors.customerId = 'Choose one of the customer organizations.';
	if (input.brokerId) {
		const broker = await Organization.findByPk(input.brokerId, { transaction });
		if (!broker || broker.kind !== 'broker')
			errors.brokerId = 'Choose one of the customs broker firms.';
	}
	const retiredAnew = (row: { id: string; active: boolean }, field: keyof Shipment) =>
		!row.active && current?.[field] !== row.id;
	for (const field of ['consigneeId', 'notifyPartyId'] as const) {
		if (!input[field]) continue;
		const party = await Party.findByPk(input[field], { transaction });
		if (!party) errors[field] = 'No such party.';
		else if (retiredAnew(party, field)) errors[field] = `${party.name} is retired; choose another.`;
	}
	for (const field of ['originId', 'destinationId'] as const) {
		const place = await Place.findByPk(input[field], { transaction });
		if (!place) errors[field] = 'No such place.';
		else if (retiredAnew(place, field)) errors[field] = `${place.code} is retired; choose another.`;
	}
	if (input.palletTypeId && !(await PalletTypeRow.findByPk(input.palletTypeId, { transaction }))) {
		errors.palletTypeId = 'No such pallet type.';
	}
	return errors;
}

function headerFields(input: ShipmentInput) {
	const orNull = (v: string) => (v === '' ? null : v);
	return {
		customerId: input.customerId,
		brokerId: orNull(input.brokerId),
		consigneeId: orNull(input.consigneeId),
		notifyPartyId: orNull(input.notifyPartyId),
		incoterm: input.incoterm,
		incotermPlace: input.incotermPlace,
		originId: input.originId,
		destinationId: input.destinationId,
		modesConsidered: [...new Set(input.modesConsidered)],
		chosenMode: input.chosenMode === '' ? null : input.chosenMode,
		currency: input.currency,
		palletTypeId: orNull(input.palletTypeId),
		carrier: orNull(input.carrier),
		vessel: orNull(input.vessel),
		voyageOrFlight: orNull(input.voyageOrFlight),
		bookingNumber: orNull(input.bookingNumber),
		etd: orNull(input.etd),
		eta: orNull(input.eta),
		notes: orNull(input.notes)
	};
}

async function run<T>(work: (t: Transaction) => Promise<T>): Promise<ServiceResult<T>> {
	try {
		return { ok: true, value: await Shipment.sequelize!.transaction(work) };
	} catch (error) {
		if (error instanceof Refused) return error.result;
		throw error;
	}
}

export async function createShipment(actor: SessionUser, input: ShipmentInput, ip: string | null) {
	return run(async (transaction) => {
		if (!canEditShipments(actor)) {
			throw new Refused(refusal(403, 'Only coordinators and administrators create shipments.'));
		}
		const errors = await checkReferences(input, transaction);
		if (Object.keys(errors).length)
			throw new Refused(refusal(400, 'Check the highlighted fields.', errors));
		const reference = await nextReference(
			transaction,
			actor.organizationId,
			new Date().getUTCFullYear()
		);
		const shipment = await Shipment.create(
			{ ...headerFields(input), reference, exporterId: actor.organizationId, createdBy: actor.id },
			{ transaction }
		);
		await ShipmentStatusEvent.create(
			{
				shipmentId: shipment.id,
				fromStatus: null,
				toStatus: 'draft',
				actorUserId: actor.id,
				note: null
			},
			{ transaction }
		);
		await recordAudit(
			{
				actorUserId: actor.id,
				action: 'shipment.create',
				entity: 'shipment',
				entityId: shipment.id,
				after: { reference, ...headerFields(input) },
				ip
			},
			transaction
		);
		return { id: shipment.id, reference };
	});
}

async function lockShipment(user: SessionUser, id: string, transaction: Transaction) {
	// Routes check the role too; the service refuses on its own as well (defence in depth).
	if (!canEditShipments(user)) {
		throw new Refused(refusal(403, 'Only coordinators and administrators change shipments.'));
	}
	const shipment = await Shipment.findOne({
		where: { [Op.and]: [{ id }, shipmentScopeWhere(user)] },
		transaction,
		lock: transaction.LOCK.UPDATE
	});
	if (!shipment) throw new Refused(NOT_FOUND);
	return shipment;
}

function requireEditable(shipment: Shipment) {
	if (!EDITABLE_STATUSES.includes(shipment.status)) {
		throw new Refused(
			refusal(
				409,
				`This shipment is “${shipment.status.replace('_', ' ')}”: its data is frozen. Move it back to booked to correct it.`
			)
		);
	}
}

export async function updateShipment(
	actor: SessionUser,
	id: string,
	input: ShipmentInput,
	ip: string | null
) {
	return run(async (transaction) => {
		const shipment = await lockShipment(actor, id, transaction);
		requireEditable(shipment);
		const errors = await checkReferences(input, transaction, shipment);
		if (Object.keys(errors).length)
			throw new Refused(refusal(400, 'Check the highlighted fields.', errors));
		await bumpVersion(transaction, id, input.version);
		const before = headerFields({
			...input,
			...shipment.get({ plain: true })
		} as unknown as ShipmentInput);
		await Shipment.update(headerFields(input), { where: { id }, transaction, silent: true });
		await recordAudit(
			{
				actorUserId: actor.id,
				action: 'shipment.update',
				entity: 'shipment',
				entityId: id,
				before,
				after: headerFields(input),
				ip
			},
			transaction
		);
		return { id };
	});
}

function paperFields(input: PaperDetailsInput) {
	const orNull = (v: string | undefined) => (v === undefined || v === '' ? null : v);
	return {
		paymentTerms: orNull(input.paymentTerms),
		exportReason: orNull(input.exportReason),
		freightAmount: input.freightAmount ? new Decimal(input.freightAmount).toFixed(4) : null,
		insuranceAmount: input.insuranceAmount ? new Decimal(input.insuranceAmount).toFixed(4) : null,
		marks: orNull(input.marks),
		signatoryName: orNull(input.signatoryName),
		signatoryTitle: orNull(input.signatoryTitle),
		signingPlace: orNull(input.signingPlace),
		preferentialOriginClaimed: input.preferentialOriginClaimed,
		preferentialAgreement: orNull(input.preferentialAgreement),
		originStatement: orNull(input.originStatement)
	};
}

/** The fields only the customs papers print (payment terms, charges, marks, signatory). */
export async function updatePaperDetails(
	actor: SessionUser,
	id: string,
	input: PaperDetailsInput,
	ip: string | null
) {
	return run(async (transaction) => {
		const shipment = await lockShipment(actor, id, transaction);
		requireEditable(shipment);
		await bumpVersion(transaction, id, input.version);
		const after = paperFields(input);
		const plain = shipment.get({ plain: true });
		const before = Object.fromEntries(
			Object.keys(after).map((k) => [k, plain[k as keyof typeof plain] ?? null])
		);
		await Shipment.update(after, { where: { id }, transaction, silent: true });
		await recordAudit(
			{
				actorUserId: actor.id,
				action: 'shipment.papers',
				entity: 'shipment',
				entityId: id,
				before,
				after,
				ip
			},
			transaction
		);
		return { id };
	});
}

export async function replaceLines(
	actor: SessionUser,
	id: string,
	input: ShipmentLinesInput,
	ip: string | null
) {
	return run(async (transaction) => {
		const shipment = await lockShipment(actor, id, transaction);
		requireEditable(shipment);
		const products = await Product.findAll({
			where: { id: [...new Set(input.lines.map((l) => l.productId))] },
			transaction
		});
		const byId = new Map(products.map((p) => [p.id, p]));
		const errors: Record<string, string> = {};
		input.lines.forEach((line, i) => {
			if (!byId.has(line.productId)) errors[`lines.${i}.productId`] = 'No such product.';
		});
		if (Object.keys(errors).length)
			throw new Refused(refusal(400, 'Some lines need attention.', errors));
		await bumpVersion(transaction, id, input.version);
		await ShipmentLine.destroy({ where: { shipmentId: id }, transaction });
		await ShipmentLine.bulkCreate(
			input.lines.map((line, i) => ({
				shipmentId: id,
				position: i + 1,
				productId: line.productId,
				quantity: line.quantity,
				unitPrice:
					line.unitPrice === ''
						? byId.get(line.productId)!.unitPrice
						: new Decimal(line.unitPrice).toFixed(4)
			})),
			{ transaction }
		);
		await recordAudit(
			{
				actorUserId: actor.id,
				action: 'shipment.lines',
				entity: 'shipment',
				entityId: id,
				after: { lines: input.lines },
				ip
			},
			transaction
		);
		return { id, lines: input.lines.length };
	});
}

export async function changeStatus(
	actor: SessionUser,
	id: string,
	input: { to: ShipmentStatus; note: string; version: number },
	ip: string | null
) {
	if (input.to === 'documents_issued' && canEditShipments(actor)) {
		// The status says the papers are out: they must exist and match the shipment as it is.
		const problem = await papersOutOfDate(actor, id);
		if (problem) return refusal(409, problem, { to: problem });
	}
	return run(async (transaction) => {
		const shipment = await lockShipment(actor, id, transaction);
		if (!canTransition(shipment.status, input.to)) {
			throw new Refused(
				refusal(400, `A shipment cannot go from ${shipment.status} to ${input.to}.`, {
					to: 'Not allowed from the current status.'
				})
			);
		}
		if (input.to === 'booked' && shipment.status === 'draft') {
			const lines = await ShipmentLine.count({ where: { shipmentId: id }, transaction });
			const missing = [
				lines === 0 && 'at least one line',
				!shipment.chosenMode && 'the chosen mode'
			].filter(Boolean);
			if (missing.length)
				throw new Refused(refusal(400, `Before booking, add ${missing.join(' and ')}.`));
		}
		await bumpVersion(transaction, id, input.version);
		await Shipment.update({ status: input.to }, { where: { id }, transaction, silent: true });
		await ShipmentStatusEvent.create(
			{
				shipmentId: id,
				fromStatus: shipment.status,
				toStatus: input.to,
				actorUserId: actor.id,
				note: input.note || null
			},
			{ transaction }
		);
		await recordAudit(
			{
				actorUserId: actor.id,
				action: 'shipment.status',
				entity: 'shipment',
				entityId: id,
				before: { status: shipment.status },
				after: { status: input.to, note: input.note },
				ip
			},
			transaction
		);
		if (input.to === 'booked' && shipment.status === 'draft') await shipmentBooked(transaction, id);
		return { id, status: input.to };
	});
}

export async function addContainer(
	actor: SessionUser,
	id: string,
	input: { containerNumber: string; containerTypeId: string; sealNumber: string; version: number },
	ip: string | null
) {
	return run(async (transaction) => {
		const shipment = await lockShipment(actor, id, transaction);
		if (['delivered', 'cancelled'].includes(shipment.status))
			throw new Refused(refusal(409, 'This shipment is closed.'));
		if (
			input.containerTypeId &&
			!(await ContainerTypeRow.findByPk(input.containerTypeId, { transaction }))
		) {
			throw new Refused(
				refusal(400, 'Check the highlighted fields.', {
					containerTypeId: 'No such container type.'
				})
			);
		}
		if (
			await ShipmentContainer.findOne({
				where: { shipmentId: id, containerNumber: input.containerNumber },
				transaction
			})
		) {
			throw new Refused(
				refusal(400, 'Check the highlighted fields.', {
					containerNumber: 'This container is already on the shipment.'
				})
			);
		}
		await bumpVersion(transaction, id, input.version);
		const container = await ShipmentContainer.create(
			{
				shipmentId: id,
				containerNumber: input.containerNumber,
				containerTypeId: input.containerTypeId || null,
				sealNumber: input.sealNumber || null
			},
			{ transaction }
		);
		await recordAudit(
			{
				actorUserId: actor.id,
				action: 'shipment.container_add',
				entity: 'shipment',
				entityId: id,
				after: { containerNumber: input.containerNumber, sealNumber: input.sealNumber },
				ip
			},
			transaction
		);
		return { id: container.id };
	});
}

export async function removeContainer(
	actor: SessionUser,
	id: string,
	containerId: string,
	version: number,
	ip: string | null
) {
	return run(async (transaction) => {
		await lockShipment(actor, id, transaction);
		const container = await ShipmentContainer.findOne({
			where: { id: containerId, shipmentId: id },
			transaction
		});
		if (!container) throw new Refused(refusal(404, 'No such container on this shipment.'));
		await bumpVersion(transaction, id, version);
		await container.destroy({ transaction });
		await recordAudit(
			{
				actorUserId: actor.id,
				action: 'shipment.container_remove',
				entity: 'shipment',
				entityId: id,
				before: { containerNumber: container.containerNumber },
				ip
			},
			transaction
		);
		return { id: containerId };
	});
}
