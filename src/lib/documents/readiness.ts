/**
 * Before a paper is issued: everything missing that customs or the buyer would miss, each with
 * where to fix it. Issuing is refused while any item is listed.
 *
 * Pure module: no framework imports.
 */
import { validateHsCode } from '../trade/hs-code';
import { isIncoterm } from '../trade/incoterms';
import { incotermCosts } from '../trade/incoterm-costs';
import { complianceBlocking } from './compliance-readiness';
import type { DocumentSource, SourceParty } from './source';

/** Where the user fixes it: a section of the shipment page, or a product's page. */
export type ReadinessArea =
	'status' | 'header' | 'lines' | 'papers' | 'parties' | 'product' | 'documents';

export interface ReadinessItem {
	area: ReadinessArea;
	/** The field at fault, e.g. 'paymentTerms', or 'lines.3.hsCode'. */
	field: string;
	message: string;
	/** The product's SKU, for area 'product'. */
	sku?: string;
}

const ISSUABLE = new Set(['booked', 'documents_issued', 'in_transit', 'arrived', 'cleared']);

function blank(value: string | null | undefined): boolean {
	return value === null || value === undefined || value.trim() === '';
}

function partyProblems(
	party: SourceParty | null,
	role: string,
	field: string,
	area: ReadinessArea,
	needsTaxId: boolean
): ReadinessItem[] {
	if (!party) return [{ area, field, message: `No ${role} is set.` }];
	const out: ReadinessItem[] = [];
	if (blank(party.line1) || blank(party.city))
		out.push({ area, field, message: `The ${role} (${party.name}) has no street and city.` });
	if (needsTaxId && party.taxIds.length === 0)
		out.push({
			area,
			field,
			message: `The ${role} (${party.name}) has no tax identifier (VAT, EORI, EIN…).`
		});
	return out;
}

/** What stops the papers of `source` from being issued; empty when they can be. */
export function readiness(source: DocumentSource): ReadinessItem[] {
	const items: ReadinessItem[] = [];
	const push = (area: ReadinessArea, field: string, message: string) =>
		items.push({ area, field, message });

	if (!ISSUABLE.has(source.status))
		push(
			'status',
			'status',
			source.status === 'draft'
				? 'The shipment is a draft: book it before issuing papers.'
				: `Papers cannot be issued for a ${source.status.replace('_', ' ')} shipment.`
		);
	if (!isIncoterm(source.incoterm)) push('header', 'incoterm', 'No Incoterms rule is set.');
	if (blank(source.incotermPlace))
		push('header', 'incotermPlace', 'The Incoterms named place is missing.');
	if (!source.origin) push('header', 'originId', 'The origin is missing.');
	if (!source.destination) push('header', 'destinationId', 'The destination is missing.');

	items.push(...partyProblems(source.exporter, 'exporter', 'exporter', 'parties', true));
	items.push(...partyProblems(source.buyer, 'buyer', 'buyer', 'parties', false));
	items.push(...partyProblems(source.consignee, 'consignee', 'consigneeId', 'header', false));

	const d = source.details;
	if (blank(d.paymentTerms)) push('papers', 'paymentTerms', 'The payment terms are missing.');
	if (blank(d.exportReason)) push('papers', 'exportReason', 'The reason for export is missing.');
	if (blank(d.signatoryName)) push('papers', 'signatoryName', 'The signatory is missing.');
	if (blank(d.signatoryTitle))
		push('papers', 'signatoryTitle', "The signatory's title is missing.");
	if (blank(d.signingPlace)) push('papers', 'signingPlace', 'The place of signing is missing.');
	if (isIncoterm(source.incoterm)) {
		const costs = incotermCosts(source.incoterm);
		if (costs.freight === 'included' && blank(d.freightAmount))
			push(
				'papers',
				'freightAmount',
				`${source.incoterm} puts freight in the price: enter the freight amount.`
			);
		if (costs.sellerMustInsure && blank(d.insuranceAmount))
			push(
				'papers',
				'insuranceAmount',
				`${source.incoterm} obliges the seller to insure: enter the insurance amount.`
			);
	}

	if (source.lines.length === 0) push('lines', 'lines', 'The shipment has no lines.');
	const seen = new Set<string>();
	for (const line of source.lines) {
		if (seen.has(line.sku)) continue;
		seen.add(line.sku);
		const product = (field: string, message: string) =>
			items.push({ area: 'product', field, message: `${line.sku}: ${message}`, sku: line.sku });
		if (blank(line.hsCode)) product('hsCode', 'no HS code.');
		else if (!validateHsCode(line.hsCode!).ok) product('hsCode', 'the HS code is not valid.');
		if (blank(line.originCountry)) product('originCountry', 'no country of origin.');
		if (blank(line.netKgPerUnit)) product('netKgPerUnit', 'no net weight per unit.');
		if (!line.hasPackaging) product('packaging', 'no carton packaging, so no gross weight.');
	}
	if (source.lines.length > 0 && !source.measure.ok && items.every((i) => i.area !== 'product'))
		push(
			'lines',
			'lines',
			`The cartons cannot be computed: ${source.measure.problems.map((p) => p.message).join('; ')}`
		);
	items.push(...complianceBlocking(source));
	return items;
}
