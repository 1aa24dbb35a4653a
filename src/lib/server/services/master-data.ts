import { UniqueConstraintError } from 'sequelize';
import { parseTaxIdLines, type PartyInput, type PlaceInput } from '../../schemas/master-data';
import { normalizeLocationCode } from '../../trade/unlocode';
import type { SessionUser } from '../auth/session-user';
import { Party, Place } from '../db/models';
import { recordAudit } from './audit';
import type { ServiceResult } from './result';

export async function listPlaces() {
	return Place.findAll({
		attributes: ['id', 'code', 'name', 'kind', 'countryCode'],
		order: [['code', 'ASC']],
		raw: true
	});
}

export async function listParties() {
	return Party.findAll({
		attributes: ['id', 'name', 'line1', 'city', 'postalCode', 'countryCode', 'taxIds'],
		order: [['name', 'ASC']],
		raw: true
	});
}

export async function createPlace(
	actor: SessionUser,
	input: PlaceInput,
	ip: string | null
): Promise<ServiceResult<{ id: string }>> {
	try {
		const place = await Place.sequelize!.transaction(async (transaction) => {
			const created = await Place.create(
				{ ...input, code: normalizeLocationCode(input.code) },
				{ transaction }
			);
			await recordAudit(
				{
					actorUserId: actor.id,
					action: 'place.create',
					entity: 'place',
					entityId: created.id,
					after: { ...input },
					ip
				},
				transaction
			);
			return created;
		});
		return { ok: true, value: { id: place.id } };
	} catch (error) {
		if (error instanceof UniqueConstraintError) {
			return {
				ok: false,
				status: 400,
				message: 'Check the highlighted fields.',
				fieldErrors: { code: 'A place with this code exists already.' }
			};
		}
		throw error;
	}
}

export async function createParty(
	actor: SessionUser,
	input: PartyInput,
	ip: string | null
): Promise<ServiceResult<{ id: string }>> {
	const orNull = (v: string) => (v === '' ? null : v);
	const party = await Party.sequelize!.transaction(async (transaction) => {
		const created = await Party.create(
			{
				organizationId: null,
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
			},
			{ transaction }
		);
		await recordAudit(
			{
				actorUserId: actor.id,
				action: 'party.create',
				entity: 'party',
				entityId: created.id,
				after: { ...input },
				ip
			},
			transaction
		);
		return created;
	});
	return { ok: true, value: { id: party.id } };
}
