import { QueryTypes } from 'sequelize';
import type { RateCardTerms } from '../../../schemas/landed-cost';
import type { RateCardInput } from '../../../schemas/rate-cards';
import type { TransportMode } from '../../../trade/shipment-status';
import type { SessionUser } from '../../auth/session-user';
import { Place } from '../../db/models';
import { invalid, type ServiceResult } from '../result';
import { retireDatedRow, saveDatedRow, type RowSpec } from './dated-rows';

// Rate cards: freight by lane and mode, with the mode's own terms (jsonb, rateCardTermsSchema).
// Never deleted; retiring one ends its validity. One card per lane and mode at a time.

const db = () => Place.sequelize!;
const SPEC: RowSpec = { table: 'rate_cards', what: 'rate card', entity: 'rate_card' };

export interface RateCardListRow {
	id: string;
	mode: TransportMode;
	laneFrom: string;
	laneTo: string;
	currency: string;
	transitDays: number;
	distanceKm: string | null;
	terms: RateCardTerms;
	source: string;
	validFrom: string;
	validTo: string | null;
	version: number;
	/** The day it last changed (its as-of date). */
	updatedAt: string;
}

const SELECT = `SELECT id, mode, lane_from AS "laneFrom", lane_to AS "laneTo", currency, transit_days AS "transitDays",
	       trim_scale(distance_km)::text AS "distanceKm", terms, source, valid_from::text AS "validFrom",
	       valid_to::text AS "validTo", version, updated_at::date::text AS "updatedAt" FROM rate_cards`;

/** Cards of a mode and/or a lane ("MYPKG-DEHAM"), by lane, mode and newest first. */
export async function listRateCards(filter: {
	mode: TransportMode | null;
	lane: string | null;
}): Promise<RateCardListRow[]> {
	const [from, to] = filter.lane?.split('-') ?? [];
	const where = [
		filter.mode ? 'mode = :mode' : '',
		filter.lane ? 'lane_from = :from AND lane_to = :to' : ''
	].filter(Boolean);
	return db().query<RateCardListRow>(
		`${SELECT} ${where.length ? `WHERE ${where.join(' AND ')}` : ''}
		  ORDER BY lane_from, lane_to, mode, valid_from DESC`,
		{ replacements: { mode: filter.mode, from, to }, type: QueryTypes.SELECT }
	);
}

/** The lanes that have a card, for the filter. */
export async function rateCardLanes(): Promise<string[]> {
	const rows = await db().query<{ lane: string }>(
		`SELECT DISTINCT lane_from || '-' || lane_to AS lane FROM rate_cards ORDER BY 1`,
		{ type: QueryTypes.SELECT }
	);
	return rows.map((r) => r.lane);
}

export async function getRateCard(id: string): Promise<RateCardListRow | null> {
	const [row] = await db().query<RateCardListRow>(`${SELECT} WHERE id = :id`, {
		replacements: { id },
		type: QueryTypes.SELECT
	});
	return row ?? null;
}

/** The edit form's values of a stored card. */
export function rateCardFormValues(row: RateCardListRow): RateCardInput {
	return {
		laneFrom: row.laneFrom,
		laneTo: row.laneTo,
		currency: row.currency,
		transitDays: row.transitDays,
		distanceKm: row.distanceKm ?? '',
		terms: row.terms,
		source: row.source,
		validFrom: row.validFrom,
		validTo: row.validTo ?? '',
		version: row.version
	};
}

/** Adds (id null) or edits a card; refused when stale, or when it overlaps its lane's card. */
export async function saveRateCard(
	actor: SessionUser,
	id: string | null,
	input: RateCardInput,
	ip: string | null
): Promise<ServiceResult<{ id: string }>> {
	if (input.terms.mode === 'sea_fcl') {
		const known = new Set((await containerTypeChoices()).map((c) => c.code));
		const unknown = input.terms.containerRates.findIndex((r) => !known.has(r.typeCode));
		if (unknown >= 0) {
			return invalid({
				[`terms.containerRates[${unknown}].typeCode`]:
					'Not a container type of the Pallets & containers page.'
			});
		}
	}
	return saveDatedRow(
		actor,
		SPEC,
		id,
		input.version,
		{
			mode: input.terms.mode,
			lane_from: input.laneFrom,
			lane_to: input.laneTo,
			currency: input.currency,
			transit_days: input.transitDays,
			distance_km: input.distanceKm || null,
			terms: JSON.stringify(input.terms),
			source: input.source,
			valid_from: input.validFrom,
			valid_to: input.validTo || null
		},
		{ terms: 'jsonb' },
		ip
	);
}

export async function retireRateCard(
	actor: SessionUser,
	id: string,
	version: number,
	validTo: string,
	ip: string | null
): Promise<ServiceResult<{ id: string }>> {
	return retireDatedRow(actor, SPEC, id, version, validTo, ip);
}

/** Container types by code, for the FCL rates (the load plan counts containers by these codes). */
export async function containerTypeChoices(): Promise<{ code: string; name: string }[]> {
	return db().query<{ code: string; name: string }>(
		`SELECT code, name FROM container_types ORDER BY code`,
		{ type: QueryTypes.SELECT }
	);
}
