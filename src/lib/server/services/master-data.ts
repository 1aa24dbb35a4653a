import { ForeignKeyConstraintError, QueryTypes, UniqueConstraintError } from 'sequelize';
import { parseTaxIdLines, type PartyInput, type PlaceInput } from '../../schemas/master-data';
import { canEditMasterData } from '../../roles';
import { normalizeLocationCode } from '../../trade/unlocode';
import type { SessionUser } from '../auth/session-user';
import { Party, Place, type AuditJson } from '../db/models';
import { recordAudit } from './audit';
import { invalid, refused, type Refusal, type ServiceResult } from './result';
import { bumpVersion } from './versioned';

// Places and parties: list, add, edit, retire/reinstate, and remove when no shipment names them.

export async function listPlaces() {
	return Place.findAll({
		attributes: ['id', 'code', 'name', 'kind', 'countryCode', 'active'],
		order: [['code', 'ASC']],
		raw: true
	});
}

export async function listParties() {
	return Party.findAll({
		attributes: ['id', 'name', 'line1', 'city', 'postalCode', 'countryCode', 'taxIds', 'active'],
		order: [['name', 'ASC']],
		raw: true
	});
}

const notAllowed = () =>
	refused(403, 'Only coordinators and administrators change places and parties.');
const duplicateCode = () => invalid({ code: 'A place with this code exists already.' });

type Kind = 'place' | 'party';
const KINDS = {
	place: { model: Place, table: 'places', columns: ['origin_id', 'destination_id'] },
	party: { model: Party, table: 'parties', columns: ['consignee_id', 'notify_party_id'] }
} as const;

export interface Usage {
	count: number;
	/** The most recent, at most five. */
	shipments: { id: string; reference: string }[];
}

/** The shipments that name this place (as origin or destination) or party (consignee, notify). */
export async function shipmentsUsing(kind: Kind, id: string): Promise<Usage> {
	const where = KINDS[kind].columns.map((c) => `${c} = :id`).join(' OR ');
	const rows = await Place.sequelize!.query<{ id: string; reference: string; total: string }>(
		`SELECT id, reference, count(*) OVER () AS total FROM shipments WHERE ${where}
		  ORDER BY created_at DESC LIMIT 5`,
		{ replacements: { id }, type: QueryTypes.SELECT }
	);
	return {
		count: Number(rows[0]?.total ?? 0),
		shipments: rows.map(({ id, reference }) => ({ id, reference }))
	};
}

function usageText(usage: Usage): string {
	const more = usage.count > usage.shipments.length ? ', …' : '';
	const noun = usage.count === 1 ? 'shipment' : 'shipments';
	return `${usage.count} ${noun} (${usage.shipments.map((s) => s.reference).join(', ')}${more})`;
}

const placeFields = (input: PlaceInput) => ({
	code: normalizeLocationCode(input.code),
	name: input.name,
	kind: input.kind,
	countryCode: input.countryCode
});

const orNull = (v: string) => (v === '' ? null : v);
const partyFields = (input: PartyInput) => ({
	name: input.name,
	line1: input.line1,
	line2: orNull(input.line2),
	city: input.city,
	postalCode: orNull(input.postalCode),
	region: orNull(input.region),
	countryCode: input.countryCode,
	contactName: orNull(input.contactName),
	email: orNull(input.email),
	phone: orNull(input.phone),
	taxIds: parseTaxIdLines(input.taxIds)
});

export async function getPlace(id: string) {
	const place = await Place.findByPk(id, { raw: true });
	return place ? { ...place, usage: await shipmentsUsing('place', id) } : null;
}

export async function getParty(id: string) {
	const party = await Party.findByPk(id, { raw: true });
	return party ? { ...party, usage: await shipmentsUsing('party', id) } : null;
}

/** Adds (id null) or edits a place; the edit is refused if someone saved it since `version`. */
export async function savePlace(
	actor: SessionUser,
	id: string | null,
	input: PlaceInput,
	ip: string | null
): Promise<ServiceResult<{ id: string }>> {
	if (!canEditMasterData(actor.role)) return notAllowed();
	try {
		return await Place.sequelize!.transaction(async (transaction) => {
			let before: AuditJson = null;
			let savedId: string;
			if (id) {
				before = (await Place.findByPk(id, { raw: true, transaction })) as AuditJson;
				const problem = await bumpVersion('places', id, input.version, 'place', transaction);
				if (problem) return problem;
				await Place.update(placeFields(input), { where: { id }, transaction, silent: true });
				savedId = id;
			} else {
				savedId = (await Place.create(placeFields(input), { transaction })).id;
			}
			await recordAudit(
				{
					actorUserId: actor.id,
					action: id ? 'place.update' : 'place.create',
					entity: 'place',
					entityId: savedId,
					before,
					after: { ...placeFields(input) },
					ip
				},
				transaction
			);
			return { ok: true as const, value: { id: savedId } };
		});
	} catch (error) {
		if (error instanceof UniqueConstraintError) return duplicateCode();
		throw error;
	}
}

/** Adds (id null) or edits a party; the edit is refused if someone saved it since `version`. */
export async function saveParty(
	actor: SessionUser,
	id: string | null,
	input: PartyInput,
	ip: string | null
): Promise<ServiceResult<{ id: string }>> {
	if (!canEditMasterData(actor.role)) return notAllowed();
	return Party.sequelize!.transaction(async (transaction) => {
		let before: AuditJson = null;
		let savedId: string;
		if (id) {
			before = (await Party.findByPk(id, { raw: true, transaction })) as AuditJson;
			const problem = await bumpVersion('parties', id, input.version, 'party', transaction);
			if (problem) return problem;
			await Party.update(partyFields(input), { where: { id }, transaction, silent: true });
			savedId = id;
		} else {
			savedId = (
				await Party.create({ organizationId: null, ...partyFields(input) }, { transaction })
			).id;
		}
		await recordAudit(
			{
				actorUserId: actor.id,
				action: id ? 'party.update' : 'party.create',
				entity: 'party',
				entityId: savedId,
				before,
				after: { ...input },
				ip
			},
			transaction
		);
		return { ok: true as const, value: { id: savedId } };
	});
}

export const createPlace = (actor: SessionUser, input: PlaceInput, ip: string | null) =>
	savePlace(actor, null, input, ip);
export const createParty = (actor: SessionUser, input: PartyInput, ip: string | null) =>
	saveParty(actor, null, input, ip);

/**
 * Retires (active false) or reinstates a place or party. A retired one stays on the shipments
 * that name it and on their papers, but is no longer offered for new shipments.
 */
export async function setActive(
	actor: SessionUser,
	kind: Kind,
	id: string,
	version: number,
	active: boolean,
	ip: string | null
): Promise<ServiceResult<{ id: string }>> {
	if (!canEditMasterData(actor.role)) return notAllowed();
	const { model, table } = KINDS[kind];
	return Place.sequelize!.transaction(async (transaction) => {
		const problem = await bumpVersion(table, id, version, kind, transaction);
		if (problem) return problem;
		await (model as typeof Place).update({ active }, { where: { id }, transaction, silent: true });
		await recordAudit(
			{
				actorUserId: actor.id,
				action: `${kind}.${active ? 'reinstate' : 'retire'}`,
				entity: kind,
				entityId: id,
				after: { active },
				ip
			},
			transaction
		);
		return { ok: true as const, value: { id } };
	});
}

function inUse(kind: Kind, usage: Usage): Refusal {
	const what = kind === 'place' ? 'This place' : 'This party';
	return refused(
		409,
		`${what} is named on ${usageText(usage)}, so it cannot be removed: those shipments and their papers need it. Retire it instead; it then stays on them but is no longer offered for new shipments.`
	);
}

/** Deletes a place or party that no shipment names; otherwise refuses and says which use it. */
export async function removeRecord(
	actor: SessionUser,
	kind: Kind,
	id: string,
	version: number,
	ip: string | null
): Promise<ServiceResult<{ name: string }>> {
	if (!canEditMasterData(actor.role)) return notAllowed();
	const usage = await shipmentsUsing(kind, id);
	if (usage.count > 0) return inUse(kind, usage);
	const { model, table } = KINDS[kind];
	try {
		return await Place.sequelize!.transaction(async (transaction) => {
			const problem = await bumpVersion(table, id, version, kind, transaction);
			if (problem) return problem;
			const row = (await (model as typeof Party).findByPk(id, { raw: true, transaction }))!;
			// ON DELETE RESTRICT catches a shipment booked since the count above.
			await (model as typeof Party).destroy({ where: { id }, transaction });
			await recordAudit(
				{
					actorUserId: actor.id,
					action: `${kind}.remove`,
					entity: kind,
					entityId: id,
					before: row as unknown as AuditJson,
					ip
				},
				transaction
			);
			return { ok: true as const, value: { name: row.name } };
		});
	} catch (error) {
		if (error instanceof ForeignKeyConstraintError)
			return inUse(kind, await shipmentsUsing(kind, id));
		throw error;
	}
}
