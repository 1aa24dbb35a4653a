/**
 * The heading both papers share: parties, places, transport and cautions, as printed.
 *
 * Pure module: no framework imports.
 */
import { countryName } from '../reference/countries';
import { formatIncotermWithPlace, isIncoterm } from '../trade/incoterms';
import { isTransportMode, transportModeLabel } from '../trade/shipment-status';
import type { DocumentHeader, DocumentKind, PrintedParty, PrintedPlace } from './types';
import { DOCUMENT_TITLES } from './types';
import type { DocumentSource, IssueStamp, SourceParty, SourcePlace } from './source';

export function printParty(p: SourceParty): PrintedParty {
	const cityLine = [p.postalCode, p.city].filter(Boolean).join(' ');
	const addressLines = [p.line1, p.line2, cityLine, p.region, countryName(p.countryCode)]
		.map((s) => (s ?? '').trim())
		.filter((s) => s.length > 0);
	const contact = [p.contactName, p.email, p.phone].filter(Boolean).join(' · ');
	return {
		name: p.name,
		addressLines,
		countryCode: p.countryCode,
		taxIds: p.taxIds.map((t) => ({ type: t.type, value: t.value })),
		contact: contact || null
	};
}

function printPlace(p: SourcePlace): PrintedPlace {
	return {
		code: p.code,
		name: p.name,
		countryCode: p.countryCode,
		countryName: countryName(p.countryCode) ?? p.countryCode
	};
}

/** Shipping marks when none are given: consignee, destination, reference, carton count. */
export function defaultMarks(source: DocumentSource, cartons: number): string {
	return [
		source.consignee?.name.toUpperCase(),
		source.destination?.name.toUpperCase(),
		`REF ${source.reference}`,
		cartons > 0 ? `C/NO. 1–${cartons}` : null
	]
		.filter(Boolean)
		.join('\n');
}

/** Read before issuing: the source passed `readiness()`, so the parties and places are set. */
export function buildHeader(
	kind: DocumentKind,
	source: DocumentSource,
	stamp: IssueStamp,
	cartons: number,
	cautions: string[]
): DocumentHeader {
	const need = <T>(value: T | null, what: string): T => {
		if (value === null) throw new Error(`${what} is missing: run readiness() first`);
		return value;
	};
	const code = source.incoterm;
	return {
		kind,
		title: DOCUMENT_TITLES[kind],
		number: stamp.number,
		revision: stamp.revision,
		revisionReason: stamp.revisionReason,
		issuedOn: stamp.issuedOn,
		shipmentReference: source.reference,
		exporter: printParty(need(source.exporter, 'exporter')),
		buyer: printParty(need(source.buyer, 'buyer')),
		consignee: printParty(need(source.consignee, 'consignee')),
		notifyParty: source.notifyParty ? printParty(source.notifyParty) : null,
		incoterm: {
			code,
			place: source.incotermPlace,
			text: isIncoterm(code) ? formatIncotermWithPlace(code, source.incotermPlace) : code
		},
		origin: printPlace(need(source.origin, 'origin')),
		destination: printPlace(need(source.destination, 'destination')),
		mode:
			source.chosenMode && isTransportMode(source.chosenMode)
				? transportModeLabel(source.chosenMode)
				: null,
		carrier: source.carrier,
		vesselOrFlight: source.vessel,
		voyageOrFlight: source.voyageOrFlight,
		bookingNumber: source.bookingNumber,
		etd: source.etd,
		eta: source.eta,
		containers: source.containers.map((c) => ({ number: c.number, seal: c.seal, type: c.type })),
		marks: source.details.marks?.trim() || defaultMarks(source, cartons),
		cautions
	};
}
