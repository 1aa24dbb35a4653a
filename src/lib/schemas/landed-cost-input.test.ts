import { describe, expect, it } from 'vitest';
import { landedCost } from '../landed-cost';
import { baseInput, country, line, rate, tariff } from '../landed-cost/test-fixtures';
import type { LandedCostInput, RateCard } from '../landed-cost/types';
import { CALC_MAX_LINES, landedCostInputSchema } from './landed-cost-input';

const paths = (body: unknown) => {
	const parsed = landedCostInputSchema.safeParse(body);
	return parsed.success ? [] : parsed.error.issues.map((i) => i.path.join('.'));
};

/** A fuller fixture than baseInput: air card, fees, de minimis, FX, brokerage, emissions. */
function fullInput(): LandedCostInput {
	const row = { source: 'invented test data', validFrom: '2025-01-01', validTo: null };
	const card: RateCard = {
		id: 'rc-air',
		...row,
		mode: 'air',
		laneFrom: 'MYPEN',
		laneTo: 'US',
		currency: 'USD',
		transitDays: 3,
		distanceKm: '14800',
		minimumCharge: '85.00',
		breaks: [
			{ fromKg: '0', ratePerKg: '5.00' },
			{ fromKg: '45', ratePerKg: '4.20' }
		],
		surcharges: [{ label: 'Fuel', basis: 'percent_of_freight', amount: '18', currency: 'USD' }],
		originCharges: [
			{ label: 'Export clearance', basis: 'per_shipment', amount: '40', currency: 'MYR' }
		],
		destinationCharges: [
			{ label: 'Handling', basis: 'per_kg', amount: '0.2', currency: 'USD', minimum: '25' }
		]
	};
	return baseInput({
		mode: 'air',
		destinationCountry: 'US',
		goodsCurrency: 'USD',
		reportCurrency: 'USD',
		lines: Array.from({ length: 5 }, (_, i) => line({ ref: String(i + 1), sku: `SKU-${i}` })),
		measures: { grossKg: '6', volumeM3: '0.05', chargeableKg: '8.5', pallets: 0, containers: [] },
		rateCard: card,
		tariffRows: [
			tariff('8518', '4.9', { destinationCountry: 'US' }),
			tariff('851822', '0', {
				destinationCountry: 'US',
				agreement: 'TEST',
				originCountries: ['MY']
			})
		],
		country: country({
			id: 'cr-us',
			country: 'US',
			currency: 'USD',
			fees: [
				{
					id: 'fee-mpf',
					source: 'invented test data',
					validFrom: '2025-01-01',
					validTo: null,
					code: 'US-MPF',
					label: 'Merchandise processing fee',
					kind: 'ad_valorem',
					ratePercent: '0.3464',
					amount: null,
					base: 'customs_value',
					min: '32.71',
					max: '634.62',
					modes: null
				}
			],
			deMinimis: [
				{
					id: 'dm-us',
					source: 'invented test data',
					validFrom: '2025-01-01',
					validTo: null,
					dutyUpTo: '800',
					vatUpTo: null,
					currency: 'USD'
				}
			]
		}),
		exchangeRates: [rate('USD', 'MYR', '4.45')],
		brokerage: [{ label: 'Entry', basis: 'per_shipment', amount: '120', currency: 'USD' }],
		emissionFactor: {
			id: 'ef-air',
			source: 'invented test data',
			validFrom: '2025-01-01',
			validTo: null,
			gCo2ePerTonneKm: '602'
		}
	});
}

describe('landedCostInputSchema', () => {
	it('accepts the engine fixtures unchanged and gives the engine the same result', () => {
		for (const input of [baseInput(), fullInput()]) {
			const parsed = landedCostInputSchema.safeParse(JSON.parse(JSON.stringify(input)));
			expect(parsed.success, JSON.stringify(parsed.error?.issues)).toBe(true);
			expect(parsed.data).toEqual(input);
			expect(landedCost(parsed.data!)).toEqual(landedCost(input));
		}
	});

	it('names the bad field by its path', () => {
		const input = fullInput();
		input.lines[3]!.unitPrice = '12,50';
		expect(paths(input)).toEqual(['lines.3.unitPrice']);
		const other = fullInput() as unknown as Record<string, unknown>;
		Object.assign(other, { date: '2026-02-30', reportCurrency: 'XYZ', incoterm: 'DDU' });
		expect(paths(other).sort()).toEqual(['date', 'incoterm', 'reportCurrency']);
	});

	it('checks ISO codes with the reference helpers, inside reference rows too', () => {
		const input = fullInput();
		input.lines[0]!.originCountry = 'XK'; // user-assigned, not an ISO 3166-1 code
		input.lines[1]!.hsCode = '7700000'; // 7 digits
		input.rateCard!.destinationCharges[0]!.currency = 'ABC';
		input.exchangeRates[0]!.quote = 'XAU'; // not a payment currency (ISO 4217 List One)
		input.country!.fees[0]!.modes = ['rocket' as 'air'];
		input.tariffRows[1]!.originCountries = ['ZZ'];
		expect(paths(input).sort()).toEqual([
			'country.fees.0.modes.0',
			'exchangeRates.0.quote',
			'lines.0.originCountry',
			'lines.1.hsCode',
			'rateCard.destinationCharges.0.currency',
			'tariffRows.1.originCountries.0'
		]);
	});

	it('refuses negative or exponent amounts, fractions of units, unknown fields', () => {
		const input = fullInput() as unknown as Record<string, unknown> & LandedCostInput;
		input.measures.grossKg = '-1';
		input.lines[2]!.quantity = 1.5;
		input.insurance.ratePercent = '1e-2';
		input.carryingRatePercent = '250';
		(input.lines[4] as unknown as Record<string, unknown>).colour = 'black';
		expect(paths(input).sort()).toEqual([
			'carryingRatePercent',
			'insurance.ratePercent',
			'lines.2.quantity',
			'lines.4',
			'measures.grossKg'
		]);
	});

	it('checks the rate card by its mode and the rows by their dates', () => {
		const input = fullInput();
		const card = input.rateCard as unknown as Record<string, unknown>;
		card.validTo = '2024-12-31';
		expect(paths(input)).toEqual(['rateCard.validTo']);
		delete card.breaks; // the dates are compared only once the fields are well-formed
		expect(paths(input)).toEqual(['rateCard.breaks']);
		card.mode = 'hovercraft';
		expect(paths(input)).toEqual(['rateCard.mode']);
	});

	it('bounds the sizes: at most 1000 lines, at least one', () => {
		const many = baseInput({
			lines: Array.from({ length: CALC_MAX_LINES + 1 }, (_, i) => line({ ref: String(i) }))
		});
		expect(paths(many)).toEqual(['lines']);
		expect(paths(baseInput({ lines: [] }))).toEqual(['lines']);
		const enough = baseInput({
			lines: Array.from({ length: CALC_MAX_LINES }, (_, i) => line({ ref: String(i) }))
		});
		expect(paths(enough)).toEqual([]);
	});

	it('leaves missing data to the engine: null card and rules parse, the engine lists them', () => {
		const input = baseInput({ rateCard: null, country: null });
		const parsed = landedCostInputSchema.parse(input);
		const result = landedCost(parsed);
		expect(result.ok).toBe(false);
		expect(!result.ok && result.missing.map((m) => m.path)).toEqual(['rateCard', 'country']);
	});
});
