/**
 * Builders for the engine's tests and the benchmark (invented data unless a test says where its
 * figures come from). Each builder returns fresh plain objects, so tests may change them freely.
 */
import type {
	CountryRules,
	CourierRateCard,
	ExchangeRate,
	LandedCostInput,
	LandedCostLine,
	RateCard,
	TariffRow
} from './types';

const ROW = { source: 'invented test data', validFrom: '2025-01-01', validTo: null };

export function line(over: Partial<LandedCostLine> = {}): LandedCostLine {
	return {
		ref: '1',
		sku: 'SPK-100',
		hsCode: '85182200',
		originCountry: 'MY',
		quantity: 1,
		unitPrice: '100.00',
		netKg: '1.000',
		grossKg: '1.200',
		...over
	};
}

export function courierCard(over: Partial<CourierRateCard> = {}): CourierRateCard {
	return {
		id: 'rc-courier',
		...ROW,
		mode: 'courier',
		laneFrom: 'MY',
		laneTo: 'AU',
		currency: 'AUD',
		transitDays: 4,
		distanceKm: null,
		surcharges: [],
		originCharges: [],
		destinationCharges: [],
		firstHalfKg: '0',
		additionalHalfKg: '0',
		...over
	};
}

export function tariff(
	hsPrefix: string,
	ratePercent: string,
	over: Partial<TariffRow> = {}
): TariffRow {
	return {
		id: `t-${hsPrefix}-${ratePercent}`,
		...ROW,
		destinationCountry: 'AU',
		hsPrefix,
		agreement: null,
		originCountries: null,
		duty: { kind: 'ad_valorem', ratePercent },
		...over
	};
}

export function country(over: Partial<CountryRules> = {}): CountryRules {
	return {
		id: 'cr-au',
		...ROW,
		country: 'AU',
		currency: 'AUD',
		valuationBasis: 'FOB',
		vat: {
			label: 'GST',
			ratePercent: '10',
			reduced: [],
			baseIncludes: ['duty', 'freight', 'insurance']
		},
		rounding: {},
		fees: [],
		deMinimis: [],
		...over
	};
}

export function rate(base: string, quote: string, value: string, over: Partial<ExchangeRate> = {}) {
	return { id: `fx-${base}${quote}`, ...ROW, base, quote, rate: value, ...over } as ExchangeRate;
}

export function baseInput(over: Partial<LandedCostInput> = {}): LandedCostInput {
	return {
		date: '2026-03-02',
		mode: 'courier',
		reportCurrency: 'AUD',
		incoterm: 'DAP',
		originCountry: 'MY',
		destinationCountry: 'AU',
		goodsCurrency: 'AUD',
		lines: [line()],
		measures: { grossKg: '1.2', volumeM3: '0.01', chargeableKg: '1.5', pallets: 0, containers: [] },
		rateCard: courierCard() as RateCard,
		tariffRows: [tariff('8518', '5')],
		preferenceClaimed: false,
		country: country(),
		exchangeRates: [],
		insurance: { ratePercent: '0', upliftPercent: '10', minimumPremium: null, source: 'test' },
		allocation: 'value',
		brokerage: [],
		carryingRatePercent: '0',
		emissionFactor: null,
		distanceKm: null,
		...over
	};
}
