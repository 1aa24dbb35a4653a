import { QueryTypes, UniqueConstraintError } from 'sequelize';
import { canEditReferenceData } from '../../../roles';
import type { ExchangeRateImport, ExchangeRateInput } from '../../../schemas/reference-data';
import type { SessionUser } from '../../auth/session-user';
import { Place } from '../../db/models';
import { recordAudit } from '../audit';
import { invalid, refused, type ServiceResult } from '../result';

// Exchange rates by date. A rate is valid from its date until the next rate of the same pair:
// valid_to stays empty and the landed-cost lookup takes the latest rate that starts on or before
// the shipment's date (services/landed-cost/reference.ts), so adding a day never rewrites the
// rows before it.

const db = () => Place.sequelize!;

export const notAllowed = () =>
	refused(403, 'Only finance and administrators change the landed-cost reference data.');

export interface ExchangeRateListRow {
	id: string;
	base: string;
	quote: string;
	rate: string;
	validFrom: string;
	validTo: string | null;
	source: string;
}

export const LIST_LIMIT = 500;

/** The newest rates first, of one pair ("USD-EUR") or of all; at most LIST_LIMIT. */
export async function listExchangeRates(pair: { base: string; quote: string } | null) {
	const where = pair ? 'WHERE base = :base AND quote = :quote' : '';
	const rows = await db().query<ExchangeRateListRow>(
		`SELECT id, base, quote, trim_scale(rate)::text AS rate, valid_from::text AS "validFrom",
		        valid_to::text AS "validTo", source
		   FROM exchange_rates ${where}
		  ORDER BY valid_from DESC, base, quote LIMIT ${LIST_LIMIT}`,
		{ replacements: { ...pair }, type: QueryTypes.SELECT }
	);
	const pairs = await db().query<{ base: string; quote: string; count: string }>(
		`SELECT base, quote, count(*)::text AS count FROM exchange_rates GROUP BY base, quote ORDER BY base, quote`,
		{ type: QueryTypes.SELECT }
	);
	return { rows, pairs: pairs.map((p) => ({ ...p, count: Number(p.count) })) };
}

const existsAlready = (base: string, quote: string, date: string) =>
	`${base}/${quote} already has a rate from ${date}.`;

export async function addExchangeRate(
	actor: SessionUser,
	input: ExchangeRateInput,
	ip: string | null
): Promise<ServiceResult<{ id: string }>> {
	if (!canEditReferenceData(actor.role)) return notAllowed();
	try {
		return await db().transaction(async (transaction) => {
			const [row] = await db().query<{ id: string }>(
				`INSERT INTO exchange_rates (base, quote, rate, source, valid_from)
				 VALUES (:base, :quote, :rate, :source, :validFrom) RETURNING id`,
				{ replacements: { ...input }, transaction, type: QueryTypes.SELECT }
			);
			await recordAudit(
				{
					actorUserId: actor.id,
					action: 'exchange_rate.create',
					entity: 'exchange_rate',
					entityId: row!.id,
					after: { ...input },
					ip
				},
				transaction
			);
			return { ok: true as const, value: { id: row!.id } };
		});
	} catch (error) {
		if (error instanceof UniqueConstraintError) {
			return invalid({ validFrom: existsAlready(input.base, input.quote, input.validFrom) });
		}
		throw error;
	}
}

/** Records every rate of the file or none: a pair and date that exists already refuses all. */
export async function importExchangeRates(
	actor: SessionUser,
	input: ExchangeRateImport,
	ip: string | null
): Promise<ServiceResult<{ count: number }>> {
	if (!canEditReferenceData(actor.role)) return notAllowed();
	const rows = JSON.stringify(
		input.rates.map((r) => ({
			base: r.base,
			quote: r.quote,
			rate: r.rate,
			valid_from: r.validFrom
		}))
	);
	const recordset = `jsonb_to_recordset(:rows::jsonb) AS r(base text, quote text, rate numeric, valid_from date)`;
	return db().transaction(async (transaction) => {
		const clashes = await db().query<{ base: string; quote: string; day: string }>(
			`SELECT e.base, e.quote, e.valid_from::text AS day FROM exchange_rates e
			   JOIN ${recordset} ON e.base = r.base AND e.quote = r.quote AND e.valid_from = r.valid_from
			  ORDER BY e.valid_from, e.base, e.quote LIMIT 6`,
			{ replacements: { rows }, transaction, type: QueryTypes.SELECT }
		);
		if (clashes.length) {
			const listed = clashes
				.slice(0, 5)
				.map((c) => `${c.base}/${c.quote} ${c.day}`)
				.join(', ');
			return refused(
				409,
				`Nothing was imported: these rates are recorded already (${listed}${clashes.length > 5 ? ', …' : ''}). Remove those rows from the file and import it again.`
			);
		}
		await db().query(
			`INSERT INTO exchange_rates (base, quote, rate, source, valid_from)
			 SELECT r.base, r.quote, r.rate, :source, r.valid_from FROM ${recordset}`,
			{ replacements: { rows, source: input.source }, transaction }
		);
		const days = input.rates.map((r) => r.validFrom).sort();
		await recordAudit(
			{
				actorUserId: actor.id,
				action: 'exchange_rate.import',
				entity: 'exchange_rate',
				after: {
					count: input.rates.length,
					from: days[0]!,
					to: days.at(-1)!,
					source: input.source
				},
				ip
			},
			transaction
		);
		return { ok: true as const, value: { count: input.rates.length } };
	});
}
