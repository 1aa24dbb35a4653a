/**
 * The commercial invoice from a shipment that passed `readiness()`.
 *
 * Pure module: no framework imports.
 */
import { minorUnits as currencyMinorUnits } from '../reference/currencies';
import { formatHsCode } from '../trade/hs-code';
import { incotermCosts, type CostTreatment } from '../trade/incoterm-costs';
import { isIncoterm } from '../trade/incoterms';
import { buildHeader } from './header';
import { lineAmount, roundMoney, sumMoney } from './money';
import type { DocumentSource, IssueStamp } from './source';
import type { InvoiceCharge, InvoiceSnapshot } from './types';

export const INVOICE_CAUTIONS: readonly string[] = Object.freeze([
	'The HS codes, origins and values on this invoice are the exporter’s statement. Classification, ' +
		'origin and customs value are for the importer’s licensed customs broker to confirm under the ' +
		'importing country’s tariff and rules; they are not a binding ruling.',
	'Freight and insurance are shown apart from the goods so that the customs value can be built ' +
		'as the importing country requires.'
]);

/** Printed under a preferential origin statement: the wording and the proof are the exporter's. */
export const ORIGIN_STATEMENT_CAUTION =
	'The statement on origin is the exporter’s own, in the wording the trade agreement prescribes. ' +
	'A preferential rate applies only if the goods meet that agreement’s rules of origin and the ' +
	'exporter holds the proof; the importing customs authority decides. Check with a licensed ' +
	'customs broker.';

export const DECLARATION_TEXT =
	'We declare that the information on this invoice is true and correct, and that the goods ' +
	'described originate in the countries shown.';

function charge(
	what: 'Freight' | 'Insurance',
	treatment: CostTreatment,
	amount: string | null,
	code: string,
	minor: number
): InvoiceCharge {
	const hasAmount = amount !== null && amount.trim() !== '';
	if (treatment === 'excluded')
		return { included: false, amount: null, note: `Not included: the buyer's cost under ${code}` };
	if (treatment === 'optional' && !hasAmount)
		return {
			included: false,
			amount: null,
			note: `None: ${code} obliges neither party to insure`
		};
	return {
		included: true,
		amount: roundMoney(amount!, minor),
		note: `${what} to ${code === 'CIF' || code === 'CFR' ? 'the port of destination' : 'the named place'}, in the price under ${code}`
	};
}

export function buildInvoice(source: DocumentSource, stamp: IssueStamp): InvoiceSnapshot {
	if (!source.measure.ok) throw new Error('the shipment cannot be measured: run readiness() first');
	const minor = currencyMinorUnits(source.currency);
	if (minor === undefined) throw new Error(`${source.currency} has no ISO 4217 minor unit`);
	const code = source.incoterm;
	const costs = isIncoterm(code)
		? incotermCosts(code)
		: { freight: 'excluded' as const, insurance: 'excluded' as const };

	const lines = source.lines.map((l) => ({
		position: l.position,
		sku: l.sku,
		description: l.description,
		hsCode: formatHsCode(l.hsCode ?? ''),
		originCountry: l.originCountry ?? '',
		quantity: l.quantity,
		unit: 'pcs',
		unitPrice: l.unitPrice,
		amount: lineAmount(l.quantity, l.unitPrice, minor)
	}));
	const subtotal = sumMoney(
		lines.map((l) => l.amount),
		minor
	);
	const freight = charge('Freight', costs.freight, source.details.freightAmount, code, minor);
	const insurance = charge(
		'Insurance',
		costs.insurance,
		source.details.insuranceAmount,
		code,
		minor
	);
	const total = sumMoney([subtotal, freight.amount ?? '0', insurance.amount ?? '0'], minor);

	const m = source.measure;
	const cartons = m.totals.cartons;
	const packages = m.pallets
		? {
				count: m.pallets.pallets,
				kind: 'pallets' as const,
				text: `${m.pallets.pallets} ${m.pallets.pallets === 1 ? 'pallet' : 'pallets'} (${cartons} cartons)`
			}
		: {
				count: cartons,
				kind: 'cartons' as const,
				text: `${cartons} ${cartons === 1 ? 'carton' : 'cartons'}`
			};

	const d = source.details;
	return {
		...buildHeader('commercial_invoice', source, stamp, cartons, [
			...INVOICE_CAUTIONS,
			...(d.preferentialOriginClaimed ? [ORIGIN_STATEMENT_CAUTION] : [])
		]),
		kind: 'commercial_invoice',
		currency: source.currency,
		minorUnits: minor,
		paymentTerms: d.paymentTerms ?? '',
		exportReason: d.exportReason ?? '',
		lines,
		subtotal,
		freight,
		insurance,
		total,
		netKg: m.totals.netKg,
		grossKg: m.pallets ? m.pallets.grossKg : m.totals.grossKg,
		packages,
		// Absent unless claimed, so papers without a claim keep their content hash.
		...(d.preferentialOriginClaimed
			? {
					originStatement: {
						agreement: d.preferentialAgreement ?? '',
						text: d.originStatement ?? ''
					}
				}
			: {}),
		declaration: {
			text: DECLARATION_TEXT,
			signatoryName: d.signatoryName ?? '',
			signatoryTitle: d.signatoryTitle ?? '',
			place: d.signingPlace ?? '',
			date: stamp.issuedOn
		}
	};
}
