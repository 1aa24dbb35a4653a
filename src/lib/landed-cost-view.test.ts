import { describe, expect, it } from 'vitest';
import { bestModes, comparisonCsv, groupDigits } from './landed-cost-view';
import { COST_KEYS, type LandedCostOk } from './landed-cost/types';

// Invented figures, for the view logic only.
const result = (mode: string, total: string, transitDays: number) =>
	({
		mode,
		reportCurrency: 'USD',
		total: { amount: total, currency: 'USD' },
		landedCostToBuyer: { amount: total, currency: 'USD' },
		carryingCost: { amount: '1.00', currency: 'USD' },
		transitDays,
		emissionsKgCo2e: '12.5',
		components: Object.fromEntries(
			COST_KEYS.map((k) => [k, { amount: '1.00', currency: 'USD', bearer: 'buyer' }])
		)
	}) as unknown as LandedCostOk;

describe('landed-cost view', () => {
	it('marks the cheapest by exact decimal comparison and the fastest by days', () => {
		const rs = [result('air', '100.10', 4), result('sea_fcl', '100.09', 28)];
		expect(bestModes(rs)).toEqual({ cheapest: 'sea_fcl', fastest: 'air' });
		expect(bestModes([])).toEqual({ cheapest: null, fastest: null });
	});

	it('exports one column per mode, quoting cells that need it (RFC 4180)', () => {
		const csv = comparisonCsv('SHP-2026-00001', [result('air', '100.10', 4)], () => 'Air, express');
		const lines = csv.trimEnd().split('\r\n');
		expect(lines[0]).toBe('Shipment,Figure,Currency,"Air, express"');
		expect(lines).toContain('SHP-2026-00001,Total,USD,100.10');
		expect(lines.at(-1)).toBe('SHP-2026-00001,Emissions (kg CO2e),,12.5');
	});

	it('groups digits without touching the decimals', () => {
		expect(groupDigits('1234567.5')).toBe('1,234,567.5');
		expect(groupDigits('-1000')).toBe('-1,000');
		expect(groupDigits('999.12345')).toBe('999.12345');
		expect(groupDigits('n/a')).toBe('n/a');
	});
});
