/**
 * Checks on the Incoterms® 2020 rule a shipment names: an unknown rule or a missing named place
 * is an error; a sea-only rule used where the goods are handed over at a terminal, and the
 * heavy duties EXW and DDP put on one party, are warnings; the insurance a CIF or CIP seller owes
 * is information.
 *
 * Pure module: no framework imports.
 */
import { incotermObligations, INSURANCE_DUTY_TEXT } from './incoterm-obligations';
import { incoterm, type IncotermCode } from './incoterms';
import type { TransportMode } from './shipment-status';

export type IncotermCheckSeverity = 'error' | 'warning' | 'info';

export interface IncotermCheck {
	readonly severity: IncotermCheckSeverity;
	/** A stable identifier for the check, e.g. 'sea_rule_with_air'. */
	readonly id: string;
	/** The shipment field to fix: 'incoterm', 'incotermPlace' or 'mode'. */
	readonly field: 'incoterm' | 'incotermPlace' | 'mode';
	readonly message: string;
	/** The rule the suggestion replaces it with, when there is one. */
	readonly suggestion: IncotermCode | null;
	/** Issuer, document and section, with "from memory" or "common practice". */
	readonly source: string;
}

export interface IncotermCheckInput {
	code: string | null | undefined;
	namedPlace: string | null | undefined;
	mode?: TransportMode | null;
	/**
	 * True when the goods travel in a container. Defaults to true for sea freight (FCL, and LCL
	 * which is consolidated into containers at a freight station; common practice).
	 */
	containerised?: boolean | null;
}

/** The any-mode rule that does the same job as each sea-only rule (ICC guidance notes). */
export const ANY_MODE_EQUIVALENT: Readonly<Record<'FAS' | 'FOB' | 'CFR' | 'CIF', IncotermCode>> =
	Object.freeze({ FAS: 'FCA', FOB: 'FCA', CFR: 'CPT', CIF: 'CIP' });

const ICC_GUIDANCE =
	'ICC, Incoterms® 2020, Explanatory Notes for Users to FAS, FOB, CFR and CIF (from memory)';
const ICC_NAMED_PLACE =
	'ICC, Incoterms® 2020, Introduction: specify the place or port (from memory)';

const MODE_WORDS: Readonly<Record<TransportMode, string>> = Object.freeze({
	air: 'air freight',
	sea_fcl: 'containerised sea freight',
	sea_lcl: 'containerised sea freight',
	road: 'road freight',
	courier: 'courier'
});

function seaRuleCheck(
	code: 'FAS' | 'FOB' | 'CFR' | 'CIF',
	mode: TransportMode,
	containerised: boolean
): IncotermCheck | null {
	const sea = mode === 'sea_fcl' || mode === 'sea_lcl';
	if (sea && !containerised) return null;
	const instead = ANY_MODE_EQUIVALENT[code];
	const where = sea ? 'at the container terminal' : 'to the carrier at a terminal or warehouse';
	return {
		severity: 'warning',
		id: sea ? 'sea_rule_with_container' : `sea_rule_with_${mode}`,
		field: 'incoterm',
		message:
			`${code} is meant for goods placed alongside or on board a vessel; with ${MODE_WORDS[mode]} ` +
			`the seller hands the goods over ${where}, long before that point, yet would still carry ` +
			`the risk until then. Consider ${instead} instead.`,
		suggestion: instead,
		source: ICC_GUIDANCE
	};
}

/** Every check that applies, errors first. */
export function incotermChecks(input: IncotermCheckInput): IncotermCheck[] {
	const out: IncotermCheck[] = [];
	const code = (input.code ?? '').trim();
	const rule = incoterm(code);
	if (!rule) {
		out.push({
			severity: 'error',
			id: code === '' ? 'rule_missing' : 'rule_unknown',
			field: 'incoterm',
			message:
				code === ''
					? 'Choose the Incoterms® 2020 rule.'
					: `"${code}" is not one of the 11 Incoterms® 2020 rules.`,
			suggestion: null,
			source: 'ICC, Incoterms® 2020, Introduction (from memory)'
		});
		return out;
	}
	if ((input.namedPlace ?? '').trim() === '') {
		out.push({
			severity: 'error',
			id: 'named_place_missing',
			field: 'incotermPlace',
			message: `Name the ${rule.namedPlaceHint} after ${rule.code}, as precisely as you can.`,
			suggestion: null,
			source: ICC_NAMED_PLACE
		});
	}
	const mode = input.mode ?? null;
	if (rule.seaOnly && mode !== null) {
		const containerised = input.containerised ?? (mode === 'sea_fcl' || mode === 'sea_lcl');
		const check = seaRuleCheck(rule.code as 'FAS' | 'FOB' | 'CFR' | 'CIF', mode, containerised);
		if (check) out.push(check);
	}
	out.push(...dutyChecks(rule.code));
	return out;
}

function dutyChecks(code: IncotermCode): IncotermCheck[] {
	switch (code) {
		case 'EXW':
			return [
				{
					severity: 'warning',
					id: 'exw_export_clearance',
					field: 'incoterm',
					message:
						'Under EXW the buyer clears the goods for export and loads them, yet many customs administrations expect the exporter in their country to declare; the seller may still be the exporter of record. FCA at the seller’s premises puts export clearance and loading on the seller.',
					suggestion: 'FCA',
					source:
						'ICC, Incoterms® 2020, EXW Explanatory Notes and A7/B7 (from memory); exporter of record: common practice'
				}
			];
		case 'DDP':
			return [
				{
					severity: 'warning',
					id: 'ddp_import_clearance',
					field: 'incoterm',
					message:
						'Under DDP the seller clears the goods for import and pays the duty and import VAT/GST in the buyer’s country, which may need a registration or an importer of record there; have a licensed customs broker confirm it can be done. Otherwise DAP leaves import clearance to the buyer.',
					suggestion: 'DAP',
					source:
						'ICC, Incoterms® 2020, DDP Explanatory Notes and A7/A9 (from memory); importer of record: common practice'
				}
			];
		case 'CIF':
		case 'CIP':
			return [
				{
					severity: 'info',
					id: 'seller_insures',
					field: 'incoterm',
					message: `Under ${code} the seller must insure the goods in transit. ${INSURANCE_DUTY_TEXT[incotermObligations(code).insuranceDuty]}, in the currency of the contract.`,
					suggestion: null,
					source: `ICC, Incoterms® 2020, ${code} A5 (from memory)`
				}
			];
		default:
			return [];
	}
}
