/**
 * What the papers are made from: the shipment as stored, gathered by the server into plain data.
 * `readiness()` checks it; `buildInvoice()` and `buildPackingList()` turn it into snapshots.
 *
 * Pure module: no framework imports.
 */
import type { MeasureResult } from '../packing';
import type { PackingListSnapshot } from './types';

export interface SourceParty {
	name: string;
	line1: string | null;
	line2: string | null;
	postalCode: string | null;
	city: string | null;
	region: string | null;
	countryCode: string;
	taxIds: { type: string; value: string }[];
	contactName: string | null;
	email: string | null;
	phone: string | null;
}

export interface SourcePlace {
	code: string;
	name: string;
	countryCode: string;
}

export interface SourceLine {
	position: number;
	sku: string;
	description: string;
	hsCode: string | null;
	originCountry: string | null;
	/** kg per unit as stored, or null when the product has none. */
	netKgPerUnit: string | null;
	hasPackaging: boolean;
	quantity: number;
	unitPrice: string;
	/** How the product carries lithium batteries ('none' when it has none). */
	battery: 'none' | 'contained' | 'packed_with' | 'standalone';
	batteryChemistry: 'lithium_ion' | 'lithium_metal' | null;
	/** A current UN38.3 test summary is on file for the product or the shipment. */
	un383OnFile: boolean;
}

export interface SourceLot {
	sku: string;
	cartonFrom: number;
	cartonTo: number;
	lotNumber: string;
	serialFrom: string | null;
	serialTo: string | null;
}

/** The papers' own fields on the shipment (payment terms, signatory…), null when not set. */
export interface PaperDetails {
	paymentTerms: string | null;
	exportReason: string | null;
	/** In the shipment's currency, up to 4 decimals. */
	freightAmount: string | null;
	insuranceAmount: string | null;
	marks: string | null;
	signatoryName: string | null;
	signatoryTitle: string | null;
	signingPlace: string | null;
	/** True when the exporter claims preferential origin under a trade agreement. */
	preferentialOriginClaimed: boolean;
	preferentialAgreement: string | null;
	/** The origin statement as the user wrote it (the agreement prescribes the wording). */
	originStatement: string | null;
}

export interface DocumentSource {
	reference: string;
	status: string;
	incoterm: string;
	incotermPlace: string;
	currency: string;
	chosenMode: string | null;
	carrier: string | null;
	vessel: string | null;
	voyageOrFlight: string | null;
	bookingNumber: string | null;
	etd: string | null;
	eta: string | null;
	details: PaperDetails;
	exporter: SourceParty | null;
	buyer: SourceParty | null;
	consignee: SourceParty | null;
	notifyParty: SourceParty | null;
	origin: SourcePlace | null;
	destination: SourcePlace | null;
	containers: { number: string; seal: string | null; type: string | null }[];
	lines: SourceLine[];
	measure: MeasureResult;
	/** Name of the pallet type, when the cartons travel on pallets. */
	palletType: string | null;
	lots: SourceLot[];
	loadPlan: PackingListSnapshot['loadPlan'];
	/** A current proof of preferential origin is on file for the shipment. */
	proofOfOriginOnFile: boolean;
}

/** Number, revision and date of the paper being issued. */
export interface IssueStamp {
	number: string;
	revision: string;
	revisionReason: string | null;
	/** YYYY-MM-DD. */
	issuedOn: string;
}
