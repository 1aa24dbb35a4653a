/**
 * The 11 Incoterms® 2020 rules as data (a stub; obligations, costs and risk come later).
 *
 * Incoterms® is a registered trademark of the International Chamber of Commerce (ICC). Codes,
 * names and the split into "any mode or modes of transport" (7 rules) and "sea and inland
 * waterway transport" (4 rules: FAS, FOB, CFR, CIF) follow ICC, Incoterms® 2020, Introduction
 * and the rule headings (from memory). The named place after each code (e.g. "FOB Port Klang")
 * is what `namedPlaceHint` describes.
 *
 * Pure module: no framework imports.
 */

export const INCOTERM_CODES = [
	'EXW',
	'FCA',
	'CPT',
	'CIP',
	'DAP',
	'DPU',
	'DDP',
	'FAS',
	'FOB',
	'CFR',
	'CIF'
] as const;
export type IncotermCode = (typeof INCOTERM_CODES)[number];

export interface Incoterm {
	readonly code: IncotermCode;
	/** The rule's name as ICC writes it. */
	readonly name: string;
	/** True for the four rules meant only for sea and inland waterway transport. */
	readonly seaOnly: boolean;
	/** What the place written after the code is, e.g. "named port of shipment". */
	readonly namedPlaceHint: string;
}

/** The edition these rules come from. */
export const INCOTERMS_EDITION = 'Incoterms® 2020';

export const INCOTERMS_2020: readonly Incoterm[] = Object.freeze(
	(
		[
			['EXW', 'Ex Works', false, 'named place of delivery'],
			['FCA', 'Free Carrier', false, 'named place of delivery'],
			['CPT', 'Carriage Paid To', false, 'named place of destination'],
			['CIP', 'Carriage and Insurance Paid To', false, 'named place of destination'],
			['DAP', 'Delivered at Place', false, 'named place of destination'],
			['DPU', 'Delivered at Place Unloaded', false, 'named place of destination'],
			['DDP', 'Delivered Duty Paid', false, 'named place of destination'],
			['FAS', 'Free Alongside Ship', true, 'named port of shipment'],
			['FOB', 'Free on Board', true, 'named port of shipment'],
			['CFR', 'Cost and Freight', true, 'named port of destination'],
			['CIF', 'Cost Insurance and Freight', true, 'named port of destination']
		] as const
	).map(([code, name, seaOnly, namedPlaceHint]) =>
		Object.freeze({ code, name, seaOnly, namedPlaceHint })
	)
);

const BY_CODE: ReadonlyMap<string, Incoterm> = new Map(
	INCOTERMS_2020.map((rule) => [rule.code, rule])
);

/** True when `code` is one of the 11 Incoterms 2020 codes, exactly (upper case). */
export function isIncoterm(code: unknown): code is IncotermCode {
	return typeof code === 'string' && BY_CODE.has(code);
}

/** The rule for a code (exact, upper case), or undefined. */
export function incoterm(code: string): Incoterm | undefined {
	return BY_CODE.get(code);
}

/** "FOB", "Port Klang" → "FOB Port Klang Incoterms® 2020", the usual way to write the term. */
export function formatIncotermWithPlace(code: IncotermCode, namedPlace: string): string {
	const place = namedPlace.trim();
	return place.length > 0
		? `${code} ${place} ${INCOTERMS_EDITION}`
		: `${code} ${INCOTERMS_EDITION}`;
}
