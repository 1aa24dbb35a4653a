import type { Sequelize } from 'sequelize';
import { rateCardTermsSchema } from '../src/lib/schemas/landed-cost';
import {
	DEMO_COUNTRIES,
	DEMO_DE_MINIMIS,
	DEMO_EMISSION_FACTORS,
	DEMO_FEES,
	DEMO_FX,
	DEMO_RATE_CARDS,
	DEMO_SETTINGS,
	DEMO_TARIFFS,
	DEMO_VALIDITY,
	RATE_SOURCE
} from './demo-landed-cost';

// Landed-cost reference data for the demo lanes (seeders/demo-landed-cost.ts says what is
// invented and what has a source). Idempotent: a row is added only when none with the same key
// exists, so finance's edits and additions survive re-seeding.
export async function seed(sequelize: Sequelize): Promise<void> {
	await sequelize.transaction(async (transaction) => {
		const run = (sql: string, replacements: Record<string, unknown>) =>
			sequelize.query(sql, { replacements, transaction });
		for (const card of DEMO_RATE_CARDS) {
			const terms = rateCardTermsSchema.parse(card.terms);
			await run(
				`INSERT INTO rate_cards (mode, lane_from, lane_to, currency, transit_days, distance_km, terms, source, valid_from, valid_to)
				 SELECT :mode, :laneFrom, :laneTo, :currency, :transitDays, :distanceKm, :terms::jsonb, :source, :validFrom, :validTo
				  WHERE NOT EXISTS (SELECT 1 FROM rate_cards WHERE mode = :mode AND lane_from = :laneFrom AND lane_to = :laneTo)`,
				{
					...card,
					mode: terms.mode,
					terms: JSON.stringify(terms),
					source: RATE_SOURCE,
					...DEMO_VALIDITY
				}
			);
		}
		for (const t of DEMO_TARIFFS) {
			await run(
				`INSERT INTO tariff_rows (destination_country, hs_prefix, agreement, origin_countries, duty, source, valid_from)
				 SELECT :destinationCountry, :hsPrefix, :agreement, :origins::char(2)[], :duty::jsonb, :source, '2026-01-01'
				  WHERE NOT EXISTS (SELECT 1 FROM tariff_rows WHERE destination_country = :destinationCountry
				                       AND hs_prefix = :hsPrefix AND agreement IS NOT DISTINCT FROM :agreement)`,
				{
					...t,
					origins: t.originCountries ? `{${t.originCountries.join(',')}}` : null,
					duty: JSON.stringify({ kind: 'ad_valorem', ratePercent: t.ratePercent })
				}
			);
		}
		for (const c of DEMO_COUNTRIES) {
			await run(
				`INSERT INTO country_rules (country, currency, valuation_basis, vat, source, valid_from)
				 SELECT :country, :currency, :valuationBasis, :vat::jsonb, :source, :validFrom
				  WHERE NOT EXISTS (SELECT 1 FROM country_rules WHERE country = :country)`,
				{ ...c, vat: JSON.stringify(c.vat) }
			);
		}
		for (const f of DEMO_FEES) {
			await run(
				`INSERT INTO customs_fees (country, code, label, kind, rate_percent, min_amount, max_amount, modes, source, valid_from, valid_to)
				 SELECT :country, :code, :label, :kind, :ratePercent, :min, :max, :modes::text[], :source, :validFrom, :validTo
				  WHERE NOT EXISTS (SELECT 1 FROM customs_fees WHERE code = :code AND valid_from = :validFrom)`,
				{ ...f, modes: f.modes ? `{${f.modes.join(',')}}` : null }
			);
		}
		for (const d of DEMO_DE_MINIMIS) {
			await run(
				`INSERT INTO de_minimis_rules (country, duty_up_to, vat_up_to, currency, source, valid_from, valid_to)
				 SELECT :country, :dutyUpTo, :vatUpTo, :currency, :source, :validFrom, :validTo
				  WHERE NOT EXISTS (SELECT 1 FROM de_minimis_rules WHERE country = :country AND valid_from = :validFrom)`,
				d
			);
		}
		for (const r of DEMO_FX) {
			await run(
				`INSERT INTO exchange_rates (base, quote, rate, source, valid_from, valid_to)
				 VALUES (:base, :quote, :rate, :source, :validFrom, :validTo)
				 ON CONFLICT (base, quote, valid_from) DO NOTHING`,
				r
			);
		}
		for (const e of DEMO_EMISSION_FACTORS) {
			await run(
				`INSERT INTO emission_factors (mode, g_co2e_per_tonne_km, source, valid_from, valid_to)
				 SELECT :mode, :gCo2ePerTonneKm, :source, :validFrom, :validTo
				  WHERE NOT EXISTS (SELECT 1 FROM emission_factors WHERE mode = :mode)`,
				e
			);
		}
		const s = DEMO_SETTINGS;
		await run(
			`INSERT INTO landed_cost_settings (id, insurance_rate_percent, insurance_uplift_percent, minimum_premium,
			        insurance_source, carrying_rate_percent, allocation, brokerage)
			 VALUES (1, :rate, :uplift, :minimum, :source, :carrying, :allocation, :brokerage::jsonb)
			 ON CONFLICT (id) DO NOTHING`,
			{
				rate: s.insuranceRatePercent,
				uplift: s.insuranceUpliftPercent,
				minimum: s.minimumPremium,
				source: s.insuranceSource,
				carrying: s.carryingRatePercent,
				allocation: s.allocation,
				brokerage: JSON.stringify(s.brokerage)
			}
		);
	});
}
