/**
 * What an issued customs paper prints: a frozen snapshot, stored beside the PDF made from it.
 *
 * Every figure is already computed and rounded here (exact decimal strings, never JS floats),
 * so a renderer only lays text out and the stored snapshot explains the PDF byte for byte.
 * Amounts carry as many decimals as the currency's ISO 4217 minor unit (JPY '1235', KWD
 * '12.345'); masses are kg with 3 decimals (to the gram), volumes m³ with 3 decimals.
 *
 * Pure module: no framework imports.
 */

export const DOCUMENT_KINDS = ['commercial_invoice', 'packing_list'] as const;
export type DocumentKind = (typeof DOCUMENT_KINDS)[number];

export const DOCUMENT_TITLES: Readonly<Record<DocumentKind, string>> = Object.freeze({
	commercial_invoice: 'Commercial invoice',
	packing_list: 'Packing list'
});

/** A party as printed: name, address lines (country name last) and tax identifiers. */
export interface PrintedParty {
	name: string;
	/** e.g. ['12 Quay Road', '10115 Berlin', 'Germany']: ready to print, one per line. */
	addressLines: string[];
	countryCode: string;
	taxIds: { type: string; value: string }[];
	/** Contact person, e-mail, phone joined for printing; null when none is on record. */
	contact: string | null;
}

export interface PrintedPlace {
	/** UN/LOCODE-style code, e.g. 'MYPKG'. */
	code: string;
	name: string;
	countryCode: string;
	countryName: string;
}

export interface PrintedContainer {
	number: string;
	seal: string | null;
	type: string | null;
}

/** What both papers print at the top of every page and in their heading block. */
export interface DocumentHeader {
	kind: DocumentKind;
	title: string;
	/** e.g. 'CI-2026-00017'; the same number for every revision of one document. */
	number: string;
	/** 'A' for the first issue, then 'B', 'C'… */
	revision: string;
	/** Why this revision was issued; null for revision A. */
	revisionReason: string | null;
	/** Date of issue, YYYY-MM-DD (UTC). */
	issuedOn: string;
	shipmentReference: string;
	exporter: PrintedParty;
	/** The buyer (the customer organisation) as billed. */
	buyer: PrintedParty;
	consignee: PrintedParty;
	notifyParty: PrintedParty | null;
	/** e.g. { code: 'CIF', place: 'Rotterdam', text: 'CIF Rotterdam Incoterms® 2020' }. */
	incoterm: { code: string; place: string; text: string };
	origin: PrintedPlace;
	destination: PrintedPlace;
	/** Human words, e.g. 'Sea, full container'; null when no mode is chosen yet. */
	mode: string | null;
	carrier: string | null;
	vesselOrFlight: string | null;
	voyageOrFlight: string | null;
	bookingNumber: string | null;
	etd: string | null;
	eta: string | null;
	containers: PrintedContainer[];
	/** Shipping marks, printed as given (may hold line breaks). */
	marks: string;
	/** Cautions printed at the foot of the document (brokers, regulations, carrier). */
	cautions: string[];
}

export interface InvoiceLine {
	position: number;
	sku: string;
	description: string;
	/** Formatted with dots, e.g. '8518.22.00'. */
	hsCode: string;
	originCountry: string;
	quantity: number;
	/** Unit of quantity, e.g. 'pcs'. */
	unit: string;
	/** The agreed unit price as stored (up to 4 decimals), not rounded. */
	unitPrice: string;
	/** quantity × unitPrice rounded half-up to the currency's minor unit. */
	amount: string;
}

/** A charge line below the subtotal: freight or insurance. */
export interface InvoiceCharge {
	/** True when the Incoterms rule puts the cost in the price (e.g. freight under CIF). */
	included: boolean;
	/** The amount added to the total; null when the rule leaves the cost to the buyer. */
	amount: string | null;
	/** Why it is or is not on the invoice, e.g. 'Not included: buyer's cost under FOB'. */
	note: string;
}

export interface InvoiceSnapshot extends DocumentHeader {
	kind: 'commercial_invoice';
	currency: string;
	/** ISO 4217 minor unit digits of `currency`. */
	minorUnits: number;
	paymentTerms: string;
	exportReason: string;
	lines: InvoiceLine[];
	/** Sum of the rounded line amounts. */
	subtotal: string;
	freight: InvoiceCharge;
	insurance: InvoiceCharge;
	/** subtotal + the included charges. */
	total: string;
	netKg: string;
	grossKg: string;
	/** e.g. { count: 40, kind: 'pallets' } or { count: 312, kind: 'cartons' }. */
	packages: { count: number; kind: 'cartons' | 'pallets'; text: string };
	/** Only when preferential origin is claimed: the statement as written, and its agreement. */
	originStatement?: { agreement: string; text: string };
	declaration: {
		text: string;
		signatoryName: string;
		signatoryTitle: string;
		place: string;
		date: string;
	};
}

/** One run of alike cartons: e.g. cartons 1–40 of one line on pallets 1–2. */
export interface PackingRow {
	fromCarton: number;
	toCarton: number;
	cartons: number;
	sku: string;
	description: string;
	/** Units in each of these cartons. */
	unitsPerCarton: number;
	/** Units in the run: cartons × unitsPerCarton. */
	units: number;
	netKgPerCarton: string;
	grossKgPerCarton: string;
	/** For the run. */
	netKg: string;
	grossKg: string;
	/** Carton outer dimensions, L × W × H, mm. */
	lengthMm: number;
	widthMm: number;
	heightMm: number;
	/** For the run, m³. */
	volumeM3: string;
	/** e.g. 'P1–P2', or null when the cartons travel loose. */
	pallets: string | null;
	/** Lot or serial ranges recorded for the line, printed under the contents. */
	lots: string[];
}

export interface PackingListSnapshot extends DocumentHeader {
	kind: 'packing_list';
	rows: PackingRow[];
	totals: {
		cartons: number;
		units: number;
		netKg: string;
		/** The cartons alone. */
		grossKg: string;
		volumeM3: string;
		/** null when the cartons travel loose. */
		pallets: {
			count: number;
			type: string;
			tareKg: string;
			/** Cartons plus pallet tares. */
			grossKg: string;
			volumeM3: string;
		} | null;
	};
	/** The container load plan in figures, when one was computed for this revision. */
	loadPlan: {
		containers: {
			label: string;
			type: string;
			pieces: number;
			volumeUsedPercent: string;
			payloadKg: string;
		}[];
		/** Pieces the plan could not place (then the picture is not the whole shipment). */
		unplaced: number;
	} | null;
}

export type DocumentSnapshot = InvoiceSnapshot | PackingListSnapshot;
