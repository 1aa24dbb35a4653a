import { QueryTypes } from 'sequelize';
import { canEditReferenceData } from '../../../roles';
import {
	dutyFields,
	splitCountries,
	tariffDuty,
	type TariffInput
} from '../../../schemas/reference-data';
import type { dutyRateSchema } from '../../../schemas/landed-cost';
import type { z } from 'zod';
import type { SessionUser } from '../../auth/session-user';
import { Place } from '../../db/models';
import { recordAudit } from '../audit';
import { invalid, type ServiceResult } from '../result';
import { bumpVersion } from '../versioned';
import { notAllowed } from './exchange-rates';

// Tariff rows: duty per destination and HS prefix, general or preferential (an agreement and the
// origins it covers). Rows are never deleted; retiring one ends its validity on a day.

const db = () => Place.sequelize!;

export interface TariffListRow {
	id: string;
	destinationCountry: string;
	hsPrefix: string;
	agreement: string | null;
	originCountries: string[] | null;
	duty: z.infer<typeof dutyRateSchema>;
	source: string;
	validFrom: string;
	validTo: string | null;
	version: number;
}

const SELECT = `SELECT id, destination_country AS "destinationCountry", hs_prefix AS "hsPrefix", agreement,
	       origin_countries::text[] AS "originCountries", duty, source, valid_from::text AS "validFrom",
	       valid_to::text AS "validTo", version FROM tariff_rows`;

export async function listTariffs(destination: string | null): Promise<TariffListRow[]> {
	return db().query<TariffListRow>(
		`${SELECT} ${destination ? 'WHERE destination_country = :destination' : ''}
		  ORDER BY destination_country, hs_prefix, agreement NULLS FIRST, valid_from DESC`,
		{ replacements: { destination }, type: QueryTypes.SELECT }
	);
}

export async function tariffDestinations(): Promise<string[]> {
	const rows = await db().query<{ c: string }>(
		`SELECT DISTINCT destination_country AS c FROM tariff_rows ORDER BY 1`,
		{ type: QueryTypes.SELECT }
	);
	return rows.map((r) => r.c);
}

export async function getTariff(id: string): Promise<TariffListRow | null> {
	const [row] = await db().query<TariffListRow>(`${SELECT} WHERE id = :id`, {
		replacements: { id },
		type: QueryTypes.SELECT
	});
	return row ?? null;
}

/** The edit form's values of a stored row. */
export function tariffFormValues(row: TariffListRow): TariffInput {
	return {
		destinationCountry: row.destinationCountry,
		hsPrefix: row.hsPrefix,
		...dutyFields(row.duty),
		agreement: row.agreement ?? '',
		originCountries: (row.originCountries ?? []).join(', '),
		source: row.source,
		validFrom: row.validFrom,
		validTo: row.validTo ?? '',
		version: row.version
	};
}

const columns = (t: TariffInput) => {
	const origins = splitCountries(t.originCountries);
	return {
		destination: t.destinationCountry,
		hsPrefix: t.hsPrefix,
		agreement: t.agreement || null,
		origins: origins.length ? `{${origins.join(',')}}` : null,
		duty: JSON.stringify(tariffDuty(t)),
		source: t.source,
		validFrom: t.validFrom,
		validTo: t.validTo || null
	};
};

/** Adds (id null) or edits a tariff row; an edit is refused if someone saved it since `version`. */
export async function saveTariff(
	actor: SessionUser,
	id: string | null,
	input: TariffInput,
	ip: string | null
): Promise<ServiceResult<{ id: string }>> {
	if (!canEditReferenceData(actor.role)) return notAllowed();
	const values = columns(input);
	return db().transaction(async (transaction) => {
		let before: Record<string, unknown> | null = null;
		let savedId = id;
		if (id) {
			before = (await getTariff(id)) as Record<string, unknown> | null;
			const problem = await bumpVersion(
				'tariff_rows',
				id,
				input.version,
				'tariff row',
				transaction
			);
			if (problem) return problem;
			await db().query(
				`UPDATE tariff_rows SET destination_country = :destination, hs_prefix = :hsPrefix,
				        agreement = :agreement, origin_countries = :origins::char(2)[], duty = :duty::jsonb,
				        source = :source, valid_from = :validFrom, valid_to = :validTo WHERE id = :id`,
				{ replacements: { ...values, id }, transaction }
			);
		} else {
			const [row] = await db().query<{ id: string }>(
				`INSERT INTO tariff_rows (destination_country, hs_prefix, agreement, origin_countries, duty, source, valid_from, valid_to)
				 VALUES (:destination, :hsPrefix, :agreement, :origins::char(2)[], :duty::jsonb, :source, :validFrom, :validTo)
				 RETURNING id`,
				{ replacements: values, transaction, type: QueryTypes.SELECT }
			);
			savedId = row!.id;
		}
		await recordAudit(
			{
				actorUserId: actor.id,
				action: id ? 'tariff_row.update' : 'tariff_row.create',
				entity: 'tariff_row',
				entityId: savedId,
				before,
				after: { ...values, duty: tariffDuty(input) },
				ip
			},
			transaction
		);
		return { ok: true as const, value: { id: savedId! } };
	});
}

/** Ends the row's validity on `validTo` (shipments dated before still use it). */
export async function retireTariff(
	actor: SessionUser,
	id: string,
	version: number,
	validTo: string,
	ip: string | null
): Promise<ServiceResult<{ id: string }>> {
	if (!canEditReferenceData(actor.role)) return notAllowed();
	return db().transaction(async (transaction) => {
		const row = await getTariff(id);
		if (row && validTo < row.validFrom) {
			return invalid(
				{ validTo: `The row starts on ${row.validFrom}; its last valid day cannot be earlier.` },
				'Check the last valid day.'
			);
		}
		const problem = await bumpVersion('tariff_rows', id, version, 'tariff row', transaction);
		if (problem) return problem;
		await db().query(`UPDATE tariff_rows SET valid_to = :validTo WHERE id = :id`, {
			replacements: { id, validTo },
			transaction
		});
		await recordAudit(
			{
				actorUserId: actor.id,
				action: 'tariff_row.retire',
				entity: 'tariff_row',
				entityId: id,
				before: { validTo: row?.validTo ?? null },
				after: { validTo },
				ip
			},
			transaction
		);
		return { ok: true as const, value: { id } };
	});
}
