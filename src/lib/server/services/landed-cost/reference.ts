/**
 * Landed-cost reference rows from the database, as the engine's types (src/lib/landed-cost).
 * Rows are chosen by key and date here (the latest row that starts on or before the date); the
 * engine checks validity itself and reports an expired row instead of using it.
 */
import { QueryTypes } from 'sequelize';
import type {
	Charge,
	CountryRules,
	EmissionFactor,
	ExchangeRate,
	InsuranceTerms,
	RateCard,
	TariffRow,
	TransportMode
} from '../../../landed-cost/types';
import type { RateCardTerms } from '../../../schemas/landed-cost';
import { Shipment } from '../../db/models';

const query = <T extends object>(sql: string, replacements: Record<string, unknown>) =>
	Shipment.sequelize!.query<T>(sql, { replacements, type: QueryTypes.SELECT });

const day = (d: string | Date | null) =>
	d === null ? null : typeof d === 'string' ? d.slice(0, 10) : d.toISOString().slice(0, 10);
/** NUMERIC columns come back as strings; drop trailing zeros only where the type says so. */
const num = (v: string | null) => (v === null ? null : String(v));

interface RateCardRow {
	id: string;
	mode: TransportMode;
	lane_from: string;
	lane_to: string;
	currency: string;
	transit_days: number;
	distance_km: string | null;
	terms: RateCardTerms;
	source: string;
	valid_from: string;
	valid_to: string | null;
}

/**
 * The rate card for the lane and mode: the most specific lane first (place → place, place →
 * country, country → place, country → country), then the latest that starts by `date`.
 */
export async function findRateCard(
	mode: TransportMode,
	from: { code: string; countryCode: string },
	to: { code: string; countryCode: string },
	date: string
): Promise<RateCard | null> {
	const rows = await query<RateCardRow>(
		`SELECT id, mode, lane_from, lane_to, currency, transit_days, trim_scale(distance_km)::text AS distance_km, terms, source,
		        valid_from::text, valid_to::text
		   FROM rate_cards
		  WHERE mode = :mode AND lane_from IN (:fromCode, :fromCountry) AND lane_to IN (:toCode, :toCountry)
		    AND valid_from <= :date
		  ORDER BY (lane_from = :fromCode) DESC, (lane_to = :toCode) DESC, valid_from DESC
		  LIMIT 1`,
		{
			mode,
			fromCode: from.code,
			fromCountry: from.countryCode,
			toCode: to.code,
			toCountry: to.countryCode,
			date
		}
	);
	const r = rows[0];
	if (!r) return null;
	return {
		...r.terms,
		id: r.id,
		source: r.source,
		validFrom: day(r.valid_from)!,
		validTo: day(r.valid_to),
		laneFrom: r.lane_from,
		laneTo: r.lane_to,
		currency: r.currency,
		transitDays: r.transit_days,
		distanceKm: num(r.distance_km)
	} as RateCard;
}

export async function tariffRows(destination: string, date: string): Promise<TariffRow[]> {
	const rows = await query<{
		id: string;
		hs_prefix: string;
		agreement: string | null;
		origin_countries: string[] | null;
		duty: TariffRow['duty'];
		source: string;
		valid_from: string;
		valid_to: string | null;
	}>(
		`SELECT id, hs_prefix, agreement, origin_countries::text[], duty, source, valid_from::text, valid_to::text
		   FROM tariff_rows WHERE destination_country = :destination AND valid_from <= :date`,
		{ destination, date }
	);
	return rows.map((r) => ({
		id: r.id,
		source: r.source,
		validFrom: r.valid_from,
		validTo: r.valid_to,
		destinationCountry: destination,
		hsPrefix: r.hs_prefix,
		agreement: r.agreement,
		originCountries: r.origin_countries?.map((c) => c.trim()) ?? null,
		duty: r.duty
	}));
}

export async function countryRules(country: string, date: string): Promise<CountryRules | null> {
	const [rule] = await query<{
		id: string;
		currency: string;
		valuation_basis: 'CIF' | 'FOB';
		vat: CountryRules['vat'];
		rounding: CountryRules['rounding'];
		source: string;
		valid_from: string;
		valid_to: string | null;
	}>(
		`SELECT id, currency, valuation_basis, vat, rounding, source, valid_from::text, valid_to::text
		   FROM country_rules WHERE country = :country AND valid_from <= :date
		  ORDER BY valid_from DESC LIMIT 1`,
		{ country, date }
	);
	if (!rule) return null;
	const [fees, deMinimis] = await Promise.all([
		query<{
			id: string;
			code: string;
			label: string;
			kind: 'ad_valorem' | 'fixed';
			rate_percent: string | null;
			amount: string | null;
			min_amount: string | null;
			max_amount: string | null;
			modes: TransportMode[] | null;
			source: string;
			valid_from: string;
			valid_to: string | null;
		}>(
			// Per fee code the version that starts last by the date.
			`SELECT DISTINCT ON (code) id, code, label, kind, trim_scale(rate_percent)::text AS rate_percent, trim_scale(amount)::text AS amount, trim_scale(min_amount)::text AS min_amount,
			        trim_scale(max_amount)::text AS max_amount, modes, source, valid_from::text, valid_to::text
			   FROM customs_fees WHERE country = :country AND valid_from <= :date
			  ORDER BY code, valid_from DESC`,
			{ country, date }
		),
		query<{
			id: string;
			duty_up_to: string | null;
			vat_up_to: string | null;
			currency: string;
			source: string;
			valid_from: string;
			valid_to: string | null;
		}>(
			`SELECT id, trim_scale(duty_up_to)::text AS duty_up_to, trim_scale(vat_up_to)::text AS vat_up_to, currency, source, valid_from::text, valid_to::text
			   FROM de_minimis_rules WHERE country = :country ORDER BY valid_from`,
			{ country }
		)
	]);
	return {
		id: rule.id,
		source: rule.source,
		validFrom: rule.valid_from,
		validTo: rule.valid_to,
		country,
		currency: rule.currency,
		valuationBasis: rule.valuation_basis,
		vat: rule.vat,
		rounding: rule.rounding ?? {},
		fees: fees.map((f) => ({
			id: f.id,
			source: f.source,
			validFrom: f.valid_from,
			validTo: f.valid_to,
			code: f.code,
			label: f.label,
			kind: f.kind,
			ratePercent: f.rate_percent,
			amount: f.amount,
			base: 'customs_value' as const,
			min: f.min_amount,
			max: f.max_amount,
			modes: f.modes
		})),
		deMinimis: deMinimis.map((d) => ({
			id: d.id,
			source: d.source,
			validFrom: d.valid_from,
			validTo: d.valid_to,
			dutyUpTo: d.duty_up_to,
			vatUpTo: d.vat_up_to,
			currency: d.currency
		}))
	};
}

/** Per currency pair, the latest rate that starts by the date. */
export async function exchangeRates(date: string): Promise<ExchangeRate[]> {
	const rows = await query<{
		id: string;
		base: string;
		quote: string;
		rate: string;
		source: string;
		valid_from: string;
		valid_to: string | null;
	}>(
		`SELECT DISTINCT ON (base, quote) id, base, quote, trim_scale(rate)::text AS rate, source, valid_from::text, valid_to::text
		   FROM exchange_rates WHERE valid_from <= :date ORDER BY base, quote, valid_from DESC`,
		{ date }
	);
	return rows.map((r) => ({
		id: r.id,
		source: r.source,
		validFrom: r.valid_from,
		validTo: r.valid_to,
		base: r.base,
		quote: r.quote,
		rate: r.rate
	}));
}

export async function emissionFactor(
	mode: TransportMode,
	date: string
): Promise<EmissionFactor | null> {
	const [r] = await query<{
		id: string;
		g: string;
		source: string;
		valid_from: string;
		valid_to: string | null;
	}>(
		`SELECT id, trim_scale(g_co2e_per_tonne_km)::text AS g, source, valid_from::text, valid_to::text
		   FROM emission_factors WHERE mode = :mode AND valid_from <= :date ORDER BY valid_from DESC LIMIT 1`,
		{ mode, date }
	);
	return r
		? {
				id: r.id,
				source: r.source,
				validFrom: r.valid_from,
				validTo: r.valid_to,
				gCo2ePerTonneKm: r.g
			}
		: null;
}

export interface LandedCostSettings {
	insurance: InsuranceTerms;
	carryingRatePercent: string;
	allocation: 'weight' | 'value';
	brokerage: Record<string, Charge[]>;
}

export async function landedCostSettings(): Promise<LandedCostSettings | null> {
	const [s] = await query<{
		insurance_rate_percent: string;
		insurance_uplift_percent: string;
		minimum_premium: string | null;
		insurance_source: string;
		carrying_rate_percent: string;
		allocation: 'weight' | 'value';
		brokerage: Record<string, Charge[]>;
	}>(
		`SELECT trim_scale(insurance_rate_percent)::text AS insurance_rate_percent, trim_scale(insurance_uplift_percent)::text AS insurance_uplift_percent, trim_scale(minimum_premium)::text AS minimum_premium,
		        insurance_source, trim_scale(carrying_rate_percent)::text AS carrying_rate_percent, allocation, brokerage
		   FROM landed_cost_settings WHERE id = 1`,
		{}
	);
	if (!s) return null;
	return {
		insurance: {
			ratePercent: s.insurance_rate_percent,
			upliftPercent: s.insurance_uplift_percent,
			minimumPremium: s.minimum_premium,
			source: s.insurance_source
		},
		carryingRatePercent: s.carrying_rate_percent,
		allocation: s.allocation,
		brokerage: s.brokerage
	};
}
