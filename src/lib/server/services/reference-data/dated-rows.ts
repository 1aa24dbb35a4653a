import { QueryTypes, type Transaction } from 'sequelize';
import { canEditReferenceData } from '../../../roles';
import type { SessionUser } from '../../auth/session-user';
import { Place } from '../../db/models';
import { recordAudit } from '../audit';
import { invalid, type ServiceResult } from '../result';
import { bumpVersion } from '../versioned';
import { notAllowed } from './exchange-rates';

// Saving and retiring the dated reference rows (rate cards, country rules, fees, de minimis).
// Rows of one key (a lane and mode, a country, a fee code) may not overlap in time: the lookup
// takes the latest row starting by the date, so an overlap would silently hide the older row.
// Each save is one transaction that locks the key, checks the dates, bumps the version the editor
// saw and writes the row and its audit event, or writes nothing.

const db = () => Place.sequelize!;

export type DatedTable = 'rate_cards' | 'country_rules' | 'customs_fees' | 'de_minimis_rules';

/** The columns that say which rows compete for the same dates. */
const KEYS: Record<DatedTable, readonly string[]> = {
	rate_cards: ['mode', 'lane_from', 'lane_to'],
	country_rules: ['country'],
	customs_fees: ['country', 'code'],
	de_minimis_rules: ['country']
};

export interface RowSpec {
	table: DatedTable;
	/** In messages: "rate card", "customs fee"… */
	what: string;
	/** The audit entity: rate_card.create, …update, …retire. */
	entity: string;
}

/** A column value and, for jsonb and arrays, the cast its text needs. */
export type Columns = Record<string, unknown> & { valid_from: string; valid_to: string | null };

/** The row of the same key whose dates meet [from, to], other than `id`; null when none. */
async function overlap(
	spec: RowSpec,
	key: Record<string, unknown>,
	dates: { from: string; to: string | null },
	id: string | null,
	transaction: Transaction
): Promise<{ validFrom: string; validTo: string | null } | null> {
	const names = KEYS[spec.table];
	// Concurrent saves of the same key queue here, so two overlapping rows cannot both pass.
	await db().query(`SELECT pg_advisory_xact_lock(hashtext(:lock))`, {
		replacements: { lock: [spec.table, ...names.map((n) => String(key[n]))].join('|') },
		transaction
	});
	const [row] = await db().query<{ validFrom: string; validTo: string | null }>(
		`SELECT valid_from::text AS "validFrom", valid_to::text AS "validTo" FROM ${spec.table}
		  WHERE ${names.map((n) => `${n} = :k_${n}`).join(' AND ')}
		    AND (CAST(:id AS uuid) IS NULL OR id <> CAST(:id AS uuid))
		    AND daterange(valid_from, valid_to, '[]') && daterange(CAST(:from AS date), CAST(:to AS date), '[]')
		  ORDER BY valid_from LIMIT 1`,
		{
			replacements: {
				...Object.fromEntries(names.map((n) => [`k_${n}`, key[n]])),
				id,
				from: dates.from,
				to: dates.to
			},
			transaction,
			type: QueryTypes.SELECT
		}
	);
	return row ?? null;
}

const overlapRefusal = (spec: RowSpec, o: { validFrom: string; validTo: string | null }) =>
	invalid(
		{
			validFrom: `Another ${spec.what} of the same key is valid ${o.validFrom} – ${o.validTo ?? 'open'}. End that one first (its last valid day) or choose other dates.`
		},
		`The dates overlap another ${spec.what}; nothing was saved.`
	);

/** The stored row as is, plus its dates as text. */
async function stored(spec: RowSpec, id: string, transaction: Transaction) {
	const [row] = await db().query<Record<string, unknown> & { from: string; to: string | null }>(
		`SELECT *, valid_from::text AS "from", valid_to::text AS "to" FROM ${spec.table} WHERE id = :id`,
		{ replacements: { id }, transaction, type: QueryTypes.SELECT }
	);
	return row ?? null;
}

/**
 * Adds (id null) or edits a dated row. `columns` are column names with their values; `casts`
 * names the columns whose text needs a cast (jsonb, text[]). An edit whose `version` is stale is
 * a 409; overlapping dates are a 400 on validFrom.
 */
export async function saveDatedRow(
	actor: SessionUser,
	spec: RowSpec,
	id: string | null,
	version: number,
	columns: Columns,
	casts: Record<string, string>,
	ip: string | null
): Promise<ServiceResult<{ id: string }>> {
	if (!canEditReferenceData(actor.role)) return notAllowed();
	const names = Object.keys(columns);
	const value = (n: string) => (casts[n] ? `CAST(:${n} AS ${casts[n]})` : `:${n}`);
	return db().transaction(async (transaction) => {
		const clash = await overlap(
			spec,
			columns,
			{ from: columns.valid_from, to: columns.valid_to },
			id,
			transaction
		);
		if (clash) return overlapRefusal(spec, clash);
		let before: Record<string, unknown> | null = null;
		let savedId = id;
		if (id) {
			before = await stored(spec, id, transaction);
			const problem = await bumpVersion(spec.table, id, version, spec.what, transaction);
			if (problem) return problem;
			await db().query(
				`UPDATE ${spec.table} SET ${names.map((n) => `${n} = ${value(n)}`).join(', ')} WHERE id = :id`,
				{ replacements: { ...columns, id }, transaction }
			);
		} else {
			const [row] = await db().query<{ id: string }>(
				`INSERT INTO ${spec.table} (${names.join(', ')}) VALUES (${names.map(value).join(', ')}) RETURNING id`,
				{ replacements: columns, transaction, type: QueryTypes.SELECT }
			);
			savedId = row!.id;
		}
		await recordAudit(
			{
				actorUserId: actor.id,
				action: `${spec.entity}.${id ? 'update' : 'create'}`,
				entity: spec.entity,
				entityId: savedId,
				before,
				after: columns,
				ip
			},
			transaction
		);
		return { ok: true as const, value: { id: savedId! } };
	});
}

/** Ends the row's validity on `validTo`; refused before it starts or into another row's dates. */
export async function retireDatedRow(
	actor: SessionUser,
	spec: RowSpec,
	id: string,
	version: number,
	validTo: string,
	ip: string | null
): Promise<ServiceResult<{ id: string }>> {
	if (!canEditReferenceData(actor.role)) return notAllowed();
	return db().transaction(async (transaction) => {
		const row = await stored(spec, id, transaction);
		if (row) {
			const from = row.from;
			if (validTo < from) {
				return invalid(
					{ validTo: `It starts on ${from}; its last valid day cannot be earlier.` },
					'Check the last valid day.'
				);
			}
			const clash = await overlap(spec, row, { from, to: validTo }, id, transaction);
			if (clash) {
				return invalid(
					{
						validTo: `Another ${spec.what} of the same key starts ${clash.validFrom}; end this one before.`
					},
					'Check the last valid day.'
				);
			}
		}
		const problem = await bumpVersion(spec.table, id, version, spec.what, transaction);
		if (problem) return problem;
		await db().query(`UPDATE ${spec.table} SET valid_to = :validTo WHERE id = :id`, {
			replacements: { id, validTo },
			transaction
		});
		await recordAudit(
			{
				actorUserId: actor.id,
				action: `${spec.entity}.retire`,
				entity: spec.entity,
				entityId: id,
				before: { validTo: row?.to ?? null },
				after: { validTo },
				ip
			},
			transaction
		);
		return { ok: true as const, value: { id } };
	});
}

/** The day any of the tables last changed (the data's as-of date), or null when all are empty. */
export async function lastChanged(tables: readonly string[]): Promise<string | null> {
	const [row] = await db().query<{ day: string | null }>(
		`SELECT max(d)::date::text AS day FROM (${tables
			.map((t) => `SELECT max(updated_at) AS d FROM ${t}`)
			.join(' UNION ALL ')}) AS changes`,
		{ type: QueryTypes.SELECT }
	);
	return row?.day ?? null;
}
