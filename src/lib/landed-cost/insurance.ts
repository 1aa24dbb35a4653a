/**
 * Cargo insurance premium. Convention (documented choice): the insured value is
 * (1 + uplift) × CIF, uplift 10 % as is common practice (UCP 600 Art. 28(f)(ii): at least 110 % of
 * the CIF or CIP value when the credit is silent; Incoterms 2020 CIF/CIP A5: the price plus 10 %).
 * Because CIF itself contains the premium, CIF is solved from CFR rather than taken as
 * CFR + premium of CFR: P = r × (1 + u) × CIF and CIF = CFR + P give
 *   CIF = CFR / (1 − (1 + u) × r),
 * the formula in the trade reference notes. CFR here is goods + origin charges + freight. The
 * premium is rounded half-up to the minor unit and is at least the minimum premium, if any.
 */
import type Decimal from 'decimal.js';
import { Exact, percent, roundMinor } from './decimal';
import type { InsuranceTerms } from './types';

export interface Premium {
	cif: Decimal;
	insuredValue: Decimal;
	premium: Decimal;
	minimumApplied: boolean;
}

export function insurancePremium(cfr: Decimal, terms: InsuranceTerms, currency: string): Premium {
	const r = percent(terms.ratePercent);
	const cover = new Exact(1).plus(percent(terms.upliftPercent));
	const cif = cfr.dividedBy(new Exact(1).minus(cover.times(r)));
	const insuredValue = cif.times(cover);
	let premium = roundMinor(insuredValue.times(r), currency);
	const min = terms.minimumPremium === null ? null : new Exact(terms.minimumPremium);
	const minimumApplied = min !== null && premium.lt(min);
	if (minimumApplied) premium = roundMinor(min, currency);
	return { cif, insuredValue, premium, minimumApplied };
}
