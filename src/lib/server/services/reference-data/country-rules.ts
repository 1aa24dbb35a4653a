import { QueryTypes } from 'sequelize';
import type {
	CountryRuleInput,
	CustomsFeeInput,
	DeMinimisInput
} from '../../../schemas/country-rules';
import type { roundingRulesSchema, vatRulesSchema } from '../../../schemas/landed-cost';
import type { TransportMode } from '../../../trade/shipment-status';
import type { z } from 'zod';
import type { SessionUser } from '../../auth/session-user';
import { Place } from '../../db/models';
import type { ServiceResult } from '../result';
import { retireDatedRow, saveDatedRow, type RowSpec } from './dated-rows';

// A destination's import rules (currency, valuation basis, VAT/GST, rounding), its customs fees
// and its de minimis thresholds. Rows are never deleted; each kind keeps one row per key at a
// time (a country; a country's fee code).

const db = () => Place.sequelize!;
const select = <T extends object>(sql: string, replacements: Record<string, unknown> = {}) =>
	db().query<T>(sql, { replacements, type: QueryTypes.SELECT });
const dates = `source, valid_from::text AS "validFrom", valid_to::text AS "validTo", version,
	updated_at::date::text AS "updatedAt"`;
const blank = (v: string | null) => v ?? '';

export const RULE: RowSpec = {
	table: 'country_rules',
	what: 'country rule',
	entity: 'country_rule'
};
export const FEE: RowSpec = { table: 'customs_fees', what: 'customs fee', entity: 'customs_fee' };
export const DE_MINIMIS: RowSpec = {
	table: 'de_minimis_rules',
	what: 'de minimis rule',
	entity: 'de_minimis_rule'
};

interface Dated {
	id: string;
	source: string;
	validFrom: string;
	validTo: string | null;
	version: number;
	/** The day it last changed (its as-of date). */
	updatedAt: string;
}

export interface CountryRuleRow extends Dated {
	country: string;
	currency: string;
	valuationBasis: 'CIF' | 'FOB';
	vat: z.infer<typeof vatRulesSchema>;
	rounding: z.infer<typeof roundingRulesSchema>;
}

export interface CustomsFeeRow extends Dated {
	country: string;
	code: string;
	label: string;
	kind: 'ad_valorem' | 'fixed';
	ratePercent: string | null;
	amount: string | null;
	minAmount: string | null;
	maxAmount: string | null;
	modes: TransportMode[] | null;
}

export interface DeMinimisRow extends Dated {
	country: string;
	dutyUpTo: string | null;
	vatUpTo: string | null;
	currency: string;
}

const RULE_SELECT = `SELECT id, country, currency, valuation_basis AS "valuationBasis", vat, rounding, ${dates} FROM country_rules`;
const FEE_SELECT = `SELECT id, country, code, label, kind, trim_scale(rate_percent)::text AS "ratePercent",
	trim_scale(amount)::text AS amount, trim_scale(min_amount)::text AS "minAmount",
	trim_scale(max_amount)::text AS "maxAmount", modes, ${dates} FROM customs_fees`;
const DE_MINIMIS_SELECT = `SELECT id, country, trim_scale(duty_up_to)::text AS "dutyUpTo",
	trim_scale(vat_up_to)::text AS "vatUpTo", currency, ${dates} FROM de_minimis_rules`;

/** Every country's rules (or one country's), by country and newest first. */
export async function listCountryRules(country: string | null = null) {
	return select<CountryRuleRow>(
		`${RULE_SELECT} ${country ? 'WHERE country = :country' : ''} ORDER BY country, valid_from DESC`,
		{ country }
	);
}

export async function getCountryRule(id: string): Promise<CountryRuleRow | null> {
	const [row] = await select<CountryRuleRow>(`${RULE_SELECT} WHERE id = :id`, { id });
	return row ?? null;
}

/** Fees of a country, or of all; by code and newest first. */
export async function listFees(country: string | null) {
	return select<CustomsFeeRow>(
		`${FEE_SELECT} ${country ? 'WHERE country = :country' : ''} ORDER BY country, code, valid_from DESC`,
		{ country }
	);
}

export async function getFee(id: string): Promise<CustomsFeeRow | null> {
	const [row] = await select<CustomsFeeRow>(`${FEE_SELECT} WHERE id = :id`, { id });
	return row ?? null;
}

export async function listDeMinimis(country: string | null) {
	return select<DeMinimisRow>(
		`${DE_MINIMIS_SELECT} ${country ? 'WHERE country = :country' : ''} ORDER BY country, valid_from DESC`,
		{ country }
	);
}

export async function getDeMinimis(id: string): Promise<DeMinimisRow | null> {
	const [row] = await select<DeMinimisRow>(`${DE_MINIMIS_SELECT} WHERE id = :id`, { id });
	return row ?? null;
}

const validity = (input: { source: string; validFrom: string; validTo: string }) => ({
	source: input.source,
	valid_from: input.validFrom,
	valid_to: input.validTo || null
});
const formValidity = (row: Dated) => ({
	source: row.source,
	validFrom: row.validFrom,
	validTo: blank(row.validTo),
	version: row.version
});

export function countryRuleFormValues(row: CountryRuleRow): CountryRuleInput {
	const { country, currency, valuationBasis, vat, rounding } = row;
	return { country, currency, valuationBasis, vat, rounding, ...formValidity(row) };
}

export function feeFormValues(row: CustomsFeeRow): CustomsFeeInput {
	return {
		country: row.country,
		code: row.code,
		label: row.label,
		kind: row.kind,
		ratePercent: blank(row.ratePercent),
		amount: blank(row.amount),
		minAmount: blank(row.minAmount),
		maxAmount: blank(row.maxAmount),
		modes: row.modes ?? [],
		...formValidity(row)
	};
}

export function deMinimisFormValues(row: DeMinimisRow): DeMinimisInput {
	return {
		country: row.country,
		dutyUpTo: blank(row.dutyUpTo),
		vatUpTo: blank(row.vatUpTo),
		currency: row.currency,
		...formValidity(row)
	};
}

type Save<T> = (
	actor: SessionUser,
	id: string | null,
	input: T,
	ip: string | null
) => Promise<ServiceResult<{ id: string }>>;

export const saveCountryRule: Save<CountryRuleInput> = (actor, id, input, ip) =>
	saveDatedRow(
		actor,
		RULE,
		id,
		input.version,
		{
			country: input.country,
			currency: input.currency,
			valuation_basis: input.valuationBasis,
			vat: JSON.stringify(input.vat),
			rounding: JSON.stringify(input.rounding),
			...validity(input)
		},
		{ vat: 'jsonb', rounding: 'jsonb' },
		ip
	);

export const saveFee: Save<CustomsFeeInput> = (actor, id, input, ip) => {
	const adValorem = input.kind === 'ad_valorem';
	return saveDatedRow(
		actor,
		FEE,
		id,
		input.version,
		{
			country: input.country,
			code: input.code,
			label: input.label,
			kind: input.kind,
			// The other kind's figure is cleared: the table's CHECKs allow only the kind's own.
			rate_percent: adValorem ? input.ratePercent : null,
			amount: adValorem ? null : input.amount,
			min_amount: (adValorem && input.minAmount) || null,
			max_amount: (adValorem && input.maxAmount) || null,
			modes: input.modes.length ? `{${input.modes.join(',')}}` : null,
			...validity(input)
		},
		{ modes: 'text[]' },
		ip
	);
};

export const saveDeMinimis: Save<DeMinimisInput> = (actor, id, input, ip) =>
	saveDatedRow(
		actor,
		DE_MINIMIS,
		id,
		input.version,
		{
			country: input.country,
			duty_up_to: input.dutyUpTo || null,
			vat_up_to: input.vatUpTo || null,
			currency: input.currency,
			...validity(input)
		},
		{},
		ip
	);

/** Ends a country rule's, fee's or de minimis rule's validity on `validTo` (by its spec). */
export const retireCountryRow =
	(spec: RowSpec) =>
	(actor: SessionUser, id: string, version: number, validTo: string, ip: string | null) =>
		retireDatedRow(actor, spec, id, version, validTo, ip);
