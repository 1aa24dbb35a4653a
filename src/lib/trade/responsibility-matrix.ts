/**
 * Who does and pays what under one Incoterms® 2020 rule, as rows for a table on the shipment
 * page. Read from `incoterm-obligations.ts` (ICC, Incoterms® 2020, A/B articles named on each
 * row; from memory).
 *
 * Pure module: no framework imports.
 */
import { incotermObligations, INSURANCE_DUTY_TEXT, type TradeParty } from './incoterm-obligations';
import type { IncotermCode } from './incoterms';

export type ResponsibilityKey =
	| 'exportClearance'
	| 'loadingAtOrigin'
	| 'preCarriage'
	| 'mainCarriage'
	| 'insurance'
	| 'unloadingAtDestination'
	| 'importClearance'
	| 'importDuty';

export interface ResponsibilityRow {
	readonly key: ResponsibilityKey;
	readonly label: string;
	readonly party: TradeParty;
	/** The Incoterms 2020 articles the row comes from. */
	readonly articles: string;
	/** A qualification worth showing beside the party, or null. */
	readonly note: string | null;
}

export const RESPONSIBILITY_LABELS: Readonly<Record<ResponsibilityKey, string>> = Object.freeze({
	exportClearance: 'Export clearance',
	loadingAtOrigin: 'Loading at origin',
	preCarriage: 'Pre-carriage to the main carrier',
	mainCarriage: 'Main carriage',
	insurance: 'Insurance in transit',
	unloadingAtDestination: 'Unloading at destination',
	importClearance: 'Import clearance',
	importDuty: 'Import duty and taxes'
});

function insuranceRow(code: IncotermCode): Pick<ResponsibilityRow, 'party' | 'note'> {
	const o = incotermObligations(code);
	if (o.insuranceDuty !== 'none')
		return { party: 'seller', note: INSURANCE_DUTY_TEXT[o.insuranceDuty] };
	// No party must insure (A5/B5); whoever carries the risk in the main carriage usually does.
	return o.riskPassesAtDestination
		? {
				party: 'seller',
				note: 'No obligation to insure; the seller carries the risk to the destination.'
			}
		: {
				party: 'buyer',
				note: 'No obligation to insure; the buyer carries the risk after delivery.'
			};
}

/** The eight rows, in the order the goods travel. */
export function responsibilityMatrix(code: IncotermCode): readonly ResponsibilityRow[] {
	const o = incotermObligations(code);
	const row = (
		key: ResponsibilityKey,
		party: TradeParty,
		articles: string,
		note: string | null = null
	): ResponsibilityRow =>
		Object.freeze({ key, label: RESPONSIBILITY_LABELS[key], party, articles, note });
	const insurance = insuranceRow(code);
	return Object.freeze([
		row(
			'exportClearance',
			o.exportClearance,
			'A7/B7',
			code === 'EXW' ? 'The seller must help the buyer obtain export documents (A7).' : null
		),
		row('loadingAtOrigin', o.loadingAtOrigin, 'A2/B2, A9/B9'),
		row(
			'preCarriage',
			o.loadingAtOrigin,
			'A2/B2, A4/B4',
			code === 'FCA'
				? 'When the named place is the seller’s premises, the buyer’s carrier collects there.'
				: null
		),
		row('mainCarriage', o.mainCarriage, 'A4/B4'),
		row('insurance', insurance.party, 'A5/B5', insurance.note),
		row(
			'unloadingAtDestination',
			o.unloadingAtDestination,
			'A9/B9',
			o.family === 'C' ? 'Unless the seller’s contract of carriage includes it (A9).' : null
		),
		row('importClearance', o.importClearance, 'A7/B7'),
		row(
			'importDuty',
			o.importDuty,
			'A9/B9',
			code === 'DDP' ? 'Including import VAT/GST unless the contract says otherwise.' : null
		)
	]);
}
