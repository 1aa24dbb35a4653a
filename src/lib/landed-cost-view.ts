/**
 * What the comparison page shows of several landed-cost results: the rows, the cheapest and the
 * fastest mode, the CSV export. Pure module: no framework imports.
 */
import Decimal from 'decimal.js';
import type { CostKey, LandedCostOk } from './landed-cost/types';
import { COST_KEYS } from './landed-cost/types';

export const COST_LABELS: Readonly<Record<CostKey, string>> = Object.freeze({
	goods: 'Goods',
	originCharges: 'Origin charges',
	freight: 'Freight',
	insurance: 'Insurance',
	duty: 'Duty',
	vat: 'Import VAT / GST',
	fees: 'Customs fees',
	brokerage: 'Brokerage',
	destinationCharges: 'Destination charges'
});

/** The mode with the lowest total, and the one with the fewest transit days (ties: first). */
export function bestModes(results: readonly LandedCostOk[]): {
	cheapest: string | null;
	fastest: string | null;
} {
	if (results.length === 0) return { cheapest: null, fastest: null };
	let cheapest = results[0]!;
	let fastest = results[0]!;
	for (const r of results) {
		if (new Decimal(r.total.amount).lt(cheapest.total.amount)) cheapest = r;
		if (r.transitDays < fastest.transitDays) fastest = r;
	}
	return { cheapest: cheapest.mode, fastest: fastest.mode };
}

const csvCell = (v: string) => (/[",\n]/.test(v) ? `"${v.replace(/"/g, '""')}"` : v);

/** One row per component, one column per mode: amounts as exact decimal strings. */
export function comparisonCsv(
	reference: string,
	results: readonly LandedCostOk[],
	modeLabel: (mode: string) => string
): string {
	const head = ['Shipment', 'Figure', 'Currency', ...results.map((r) => modeLabel(r.mode))];
	const currency = results[0]?.reportCurrency ?? '';
	const rows: string[][] = [
		...COST_KEYS.map((k) => [
			reference,
			COST_LABELS[k],
			currency,
			...results.map((r) => r.components[k].amount)
		]),
		[reference, 'Total', currency, ...results.map((r) => r.total.amount)],
		[
			reference,
			'Landed cost to the buyer',
			currency,
			...results.map((r) => r.landedCostToBuyer.amount)
		],
		[reference, 'Carrying cost in transit', currency, ...results.map((r) => r.carryingCost.amount)],
		[reference, 'Transit days', '', ...results.map((r) => String(r.transitDays))],
		[reference, 'Emissions (kg CO2e)', '', ...results.map((r) => r.emissionsKgCo2e ?? '')]
	];
	return [head, ...rows].map((row) => row.map(csvCell).join(',')).join('\r\n') + '\r\n';
}

/** '1234567.5' → '1,234,567.5': thousands separators on an exact decimal string, for display. */
export function groupDigits(value: string): string {
	const m = /^(-?)(\d+)(\.\d+)?$/.exec(value);
	if (!m) return value;
	return m[1] + m[2]!.replace(/\B(?=(\d{3})+(?!\d))/g, ',') + (m[3] ?? '');
}
