/** The cautions every landed-cost estimate carries, plus those the input calls for. */
import { incoterm } from '../trade/incoterms';
import type { LandedCostInput } from './types';

export const STANDARD_CAUTIONS: readonly string[] = Object.freeze([
	'An estimate, not a customs ruling or a carrier quote: duty, taxes and fees are assessed by the customs administration at import.',
	'Classification, origin and valuation are the importer’s responsibility; have a licensed customs broker confirm them before relying on these figures.',
	'Rates, tariffs, fees, thresholds and exchange rates change; the dates of the data used are listed with the result.',
	'Import VAT/GST may be recoverable by a registered importer; ask your tax adviser.'
]);

export function cautionsFor(input: LandedCostInput): string[] {
	const out = [...STANDARD_CAUTIONS];
	const rule = incoterm(input.incoterm);
	if (rule?.seaOnly && !input.mode.startsWith('sea')) {
		out.push(
			`${rule.code} is meant for sea and inland waterway transport only (Incoterms 2020); for ${input.mode} consider the any-mode rules (FCA, CPT, CIP).`
		);
	}
	if (input.preferenceClaimed) {
		out.push(
			'A preferential rate needs a valid proof of origin and the agreement’s origin rules met; customs may verify it after import.'
		);
	}
	return out;
}
