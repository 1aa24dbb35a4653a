// Landed-cost reference data for the demo lanes. Freight rates, charges, exchange rates and the
// insurance and brokerage assumptions are INVENTED demo data (plausible orders of magnitude, not
// quotes). Tariff rates, VAT/GST rules, fees and de minimis thresholds name their source; those
// marked "from memory" must be confirmed against the official tariff before any real use.
import type { RateCardTerms } from '../src/lib/schemas/landed-cost';

const DEMO = 'Invented demo data (not a quote)';
const DEMO_FROM = '2026-01-01';
const DEMO_TO = '2027-06-30';

export interface DemoRateCard {
	laneFrom: string;
	laneTo: string;
	currency: string;
	transitDays: number;
	distanceKm: string;
	terms: RateCardTerms;
}

const perShipment = (label: string, amount: string, currency = 'USD') => ({
	label,
	basis: 'per_shipment' as const,
	amount,
	currency
});
const per = (
	basis: 'per_kg' | 'per_chargeable_kg' | 'per_container' | 'per_wm' | 'per_pallet',
	label: string,
	amount: string,
	currency = 'USD',
	minimum?: string
) => ({ label, basis, amount, currency, ...(minimum ? { minimum } : {}) });

const airBreaks = (rates: string[]) =>
	['0', '45', '100', '300', '500', '1000'].map((fromKg, i) => ({ fromKg, ratePerKg: rates[i]! }));

export const DEMO_RATE_CARDS: DemoRateCard[] = [
	{
		laneFrom: 'MYPKG',
		laneTo: 'DEHAM',
		currency: 'USD',
		transitDays: 28,
		distanceKm: '15400',
		terms: {
			mode: 'sea_fcl',
			containerRates: [
				{ typeCode: 'C20GP', ratePerContainer: '1850' },
				{ typeCode: 'C40GP', ratePerContainer: '2900' },
				{ typeCode: 'C40HC', ratePerContainer: '3050' }
			],
			surcharges: [per('per_container', 'Bunker adjustment (BAF)', '420')],
			originCharges: [
				per('per_container', 'Origin terminal handling', '145'),
				perShipment('Export documentation', '65')
			],
			destinationCharges: [
				per('per_container', 'Destination terminal handling', '245', 'EUR'),
				per('per_container', 'Delivery to consignee', '520', 'EUR')
			]
		}
	},
	{
		laneFrom: 'MYPKG',
		laneTo: 'DEHAM',
		currency: 'USD',
		transitDays: 35,
		distanceKm: '15400',
		terms: {
			mode: 'sea_lcl',
			ratePerWm: '68',
			minimumWm: '1',
			minimumCharge: '68',
			surcharges: [per('per_wm', 'Bunker adjustment (BAF)', '12')],
			originCharges: [per('per_wm', 'Origin CFS handling', '18', 'USD', '25')],
			destinationCharges: [
				per('per_wm', 'Destination CFS handling', '32', 'EUR', '40'),
				perShipment('Delivery to consignee', '120', 'EUR')
			]
		}
	},
	{
		laneFrom: 'MY',
		laneTo: 'DE',
		currency: 'USD',
		transitDays: 4,
		distanceKm: '9900',
		terms: {
			mode: 'air',
			minimumCharge: '95',
			breaks: airBreaks(['6.10', '4.85', '4.20', '3.65', '3.40', '3.15']),
			surcharges: [
				per('per_chargeable_kg', 'Fuel surcharge', '1.10'),
				per('per_chargeable_kg', 'Security surcharge', '0.15')
			],
			originCharges: [
				perShipment('Export clearance', '45'),
				per('per_kg', 'Origin terminal', '0.12', 'USD', '25')
			],
			destinationCharges: [
				per('per_kg', 'Destination handling', '0.18', 'EUR', '40'),
				perShipment('Delivery to consignee', '85', 'EUR')
			]
		}
	},
	{
		laneFrom: 'VN',
		laneTo: 'AU',
		currency: 'USD',
		transitDays: 3,
		distanceKm: '7700',
		terms: {
			mode: 'air',
			minimumCharge: '80',
			breaks: airBreaks(['5.20', '4.10', '3.55', '3.10', '2.95', '2.80']),
			surcharges: [
				per('per_chargeable_kg', 'Fuel surcharge', '0.95'),
				per('per_chargeable_kg', 'Security surcharge', '0.12')
			],
			originCharges: [perShipment('Export clearance', '40')],
			destinationCharges: [
				per('per_kg', 'Destination handling', '0.30', 'AUD', '55'),
				perShipment('Delivery to consignee', '140', 'AUD')
			]
		}
	},
	{
		laneFrom: 'VN',
		laneTo: 'AU',
		currency: 'USD',
		transitDays: 18,
		distanceKm: '8800',
		terms: {
			mode: 'sea_lcl',
			ratePerWm: '55',
			minimumWm: '1',
			minimumCharge: '55',
			surcharges: [per('per_wm', 'Bunker adjustment (BAF)', '10')],
			originCharges: [per('per_wm', 'Origin CFS handling', '15', 'USD', '20')],
			destinationCharges: [
				per('per_wm', 'Destination CFS handling', '48', 'AUD', '60'),
				perShipment('Delivery to consignee', '180', 'AUD')
			]
		}
	},
	{
		laneFrom: 'VN',
		laneTo: 'AU',
		currency: 'USD',
		transitDays: 3,
		distanceKm: '7700',
		terms: {
			mode: 'courier',
			firstHalfKg: '38.00',
			additionalHalfKg: '6.40',
			surcharges: [
				{ label: 'Fuel surcharge', basis: 'percent_of_freight', amount: '18.5', currency: 'USD' }
			],
			originCharges: [],
			destinationCharges: []
		}
	},
	{
		laneFrom: 'MYPEN',
		laneTo: 'USNYC',
		currency: 'USD',
		transitDays: 30,
		distanceKm: '18500',
		terms: {
			mode: 'sea_fcl',
			containerRates: [
				{ typeCode: 'C20GP', ratePerContainer: '2400' },
				{ typeCode: 'C40GP', ratePerContainer: '3800' },
				{ typeCode: 'C40HC', ratePerContainer: '3950' }
			],
			surcharges: [per('per_container', 'Bunker adjustment (BAF)', '510')],
			originCharges: [
				per('per_container', 'Origin terminal handling', '140'),
				perShipment('Export documentation', '65')
			],
			destinationCharges: [
				per('per_container', 'Destination terminal handling', '395'),
				per('per_container', 'Drayage to consignee', '780')
			]
		}
	},
	{
		laneFrom: 'MY',
		laneTo: 'US',
		currency: 'USD',
		transitDays: 5,
		distanceKm: '15000',
		terms: {
			mode: 'air',
			minimumCharge: '110',
			breaks: airBreaks(['7.40', '5.90', '5.10', '4.45', '4.15', '3.90']),
			surcharges: [
				per('per_chargeable_kg', 'Fuel surcharge', '1.35'),
				per('per_chargeable_kg', 'Security surcharge', '0.18')
			],
			originCharges: [perShipment('Export clearance', '45')],
			destinationCharges: [
				per('per_kg', 'Destination handling', '0.22', 'USD', '50'),
				perShipment('Delivery to consignee', '160')
			]
		}
	}
];

export const RATE_SOURCE = DEMO;
export const DEMO_VALIDITY = { validFrom: DEMO_FROM, validTo: DEMO_TO };

const EU_CN =
	'EU Combined Nomenclature 2026, third-country (erga omnes) duty, from memory: confirm in TARIC';
const AU_TARIFF =
	'Australian Customs Tariff, Schedule 3, general rate, from memory: confirm with the ABF';
const AU_PREF =
	'Australian Customs Tariff, Schedule 5/AANZFTA preferential rate, from memory: confirm';
const US_HTS =
	'US Harmonized Tariff Schedule 2026, general (column 1) rate, from memory: confirm in the HTS';

export const DEMO_TARIFFS: {
	destinationCountry: string;
	hsPrefix: string;
	agreement: string | null;
	originCountries: string[] | null;
	ratePercent: string;
	source: string;
}[] = [
	{
		destinationCountry: 'DE',
		hsPrefix: '851822',
		agreement: null,
		originCountries: null,
		ratePercent: '2',
		source: EU_CN
	},
	{
		destinationCountry: 'DE',
		hsPrefix: '850760',
		agreement: null,
		originCountries: null,
		ratePercent: '2.7',
		source: EU_CN
	},
	{
		destinationCountry: 'DE',
		hsPrefix: '9025',
		agreement: null,
		originCountries: null,
		ratePercent: '0',
		source: EU_CN
	},
	{
		destinationCountry: 'DE',
		hsPrefix: '853110',
		agreement: null,
		originCountries: null,
		ratePercent: '2.2',
		source: EU_CN
	},
	{
		destinationCountry: 'DE',
		hsPrefix: '851762',
		agreement: null,
		originCountries: null,
		ratePercent: '0',
		source: EU_CN
	},
	{
		destinationCountry: 'AU',
		hsPrefix: '8518',
		agreement: null,
		originCountries: null,
		ratePercent: '5',
		source: AU_TARIFF
	},
	{
		destinationCountry: 'AU',
		hsPrefix: '8507',
		agreement: null,
		originCountries: null,
		ratePercent: '5',
		source: AU_TARIFF
	},
	{
		destinationCountry: 'AU',
		hsPrefix: '9025',
		agreement: null,
		originCountries: null,
		ratePercent: '5',
		source: AU_TARIFF
	},
	{
		destinationCountry: 'AU',
		hsPrefix: '8531',
		agreement: null,
		originCountries: null,
		ratePercent: '5',
		source: AU_TARIFF
	},
	{
		destinationCountry: 'AU',
		hsPrefix: '8517',
		agreement: null,
		originCountries: null,
		ratePercent: '0',
		source: AU_TARIFF
	},
	{
		destinationCountry: 'AU',
		hsPrefix: '85',
		agreement: 'AANZFTA',
		originCountries: ['MY', 'VN'],
		ratePercent: '0',
		source: AU_PREF
	},
	{
		destinationCountry: 'AU',
		hsPrefix: '90',
		agreement: 'AANZFTA',
		originCountries: ['MY', 'VN'],
		ratePercent: '0',
		source: AU_PREF
	},
	{
		destinationCountry: 'US',
		hsPrefix: '851822',
		agreement: null,
		originCountries: null,
		ratePercent: '4.9',
		source: US_HTS
	},
	{
		destinationCountry: 'US',
		hsPrefix: '850760',
		agreement: null,
		originCountries: null,
		ratePercent: '3.4',
		source: US_HTS
	},
	{
		destinationCountry: 'US',
		hsPrefix: '902580',
		agreement: null,
		originCountries: null,
		ratePercent: '1.6',
		source: US_HTS
	},
	{
		destinationCountry: 'US',
		hsPrefix: '853110',
		agreement: null,
		originCountries: null,
		ratePercent: '1.3',
		source: US_HTS
	},
	{
		destinationCountry: 'US',
		hsPrefix: '851762',
		agreement: null,
		originCountries: null,
		ratePercent: '0',
		source: US_HTS
	}
];

export const DEMO_COUNTRIES = [
	{
		country: 'DE',
		currency: 'EUR',
		valuationBasis: 'CIF' as const,
		vat: {
			label: 'Import VAT',
			ratePercent: '19',
			reduced: [],
			baseIncludes: ['duty', 'destination_charges'] as const
		},
		source:
			'Union Customs Code (Regulation 952/2013) Art. 71(1)(e): CIF basis; Council Directive 2006/112/EC Arts 85–86 (VAT base) and German UStG §12(1): 19 %',
		validFrom: '2021-07-01'
	},
	{
		country: 'AU',
		currency: 'AUD',
		valuationBasis: 'FOB' as const,
		vat: {
			label: 'GST',
			ratePercent: '10',
			reduced: [],
			baseIncludes: ['duty', 'freight', 'insurance'] as const
		},
		source:
			'Customs Act 1901 s.159 (FOB basis); A New Tax System (Goods and Services Tax) Act 1999 s.13-20 (value of the taxable importation), ABF worked example',
		validFrom: '2000-07-01'
	},
	{
		country: 'US',
		currency: 'USD',
		valuationBasis: 'FOB' as const,
		vat: { label: 'No import VAT', ratePercent: '0', reduced: [], baseIncludes: [] as const },
		source: '19 U.S.C. 1401a (transaction value excludes international freight and insurance)',
		validFrom: '2000-01-01'
	}
];

export const DEMO_FEES = [
	{
		country: 'US',
		code: 'US-MPF',
		label: 'Merchandise processing fee',
		kind: 'ad_valorem' as const,
		ratePercent: '0.3464',
		min: '33.58',
		max: '651.50',
		modes: null,
		source: '19 CFR 24.23; FY2026 minimum and maximum per CBP Dec. 25-10 (90 FR 34665)',
		validFrom: '2025-10-01',
		validTo: '2026-09-30'
	},
	{
		country: 'US',
		code: 'US-MPF',
		label: 'Merchandise processing fee',
		kind: 'ad_valorem' as const,
		ratePercent: '0.3464',
		min: '33.58',
		max: '651.50',
		modes: null,
		source:
			'FY2027 assumed equal to FY2026 (demo assumption: CBP publishes the FY2027 figures; replace them)',
		validFrom: '2026-10-01',
		validTo: '2027-09-30'
	},
	{
		country: 'US',
		code: 'US-HMF',
		label: 'Harbor maintenance fee',
		kind: 'ad_valorem' as const,
		ratePercent: '0.125',
		min: null,
		max: null,
		modes: ['sea_fcl', 'sea_lcl'],
		source: '19 CFR 24.24 (sea cargo only)',
		validFrom: '2000-01-01',
		validTo: null
	}
];

export const DEMO_DE_MINIMIS = [
	{
		country: 'DE',
		dutyUpTo: '150',
		vatUpTo: null,
		currency: 'EUR',
		source: 'Council Regulation (EC) 1186/2009 Art. 23 (duty); no VAT relief since 1 July 2021',
		validFrom: '2021-07-01',
		validTo: null
	},
	{
		country: 'US',
		dutyUpTo: '800',
		vatUpTo: null,
		currency: 'USD',
		source:
			'19 U.S.C. 1321; suspended for all countries from 29 August 2025 (Executive Order 14324)',
		validFrom: '2016-03-10',
		validTo: '2025-08-28'
	},
	{
		country: 'AU',
		dutyUpTo: '1000',
		vatUpTo: '1000',
		currency: 'AUD',
		source:
			'Low value goods threshold A$1,000 (GST collected at the point of sale since 1 July 2018), from memory: confirm with the ABF',
		validFrom: '2018-07-01',
		validTo: null
	}
];

const FX_SOURCE = 'Invented demo rates (import official reference rates from a CSV file)';
/** 1 USD = rate quote, for the demo period. */
export const DEMO_FX = [
	{ base: 'USD', quote: 'EUR', rate: '0.9210' },
	{ base: 'USD', quote: 'AUD', rate: '1.5340' },
	{ base: 'USD', quote: 'MYR', rate: '4.4150' },
	{ base: 'USD', quote: 'JPY', rate: '151.20' },
	{ base: 'USD', quote: 'KWD', rate: '0.3072' }
].map((r) => ({ ...r, source: FX_SOURCE, validFrom: '2026-11-01', validTo: '2026-12-31' }));

const GLEC =
	'GLEC Framework v3 default intensity (well-to-wheel), order of magnitude from memory: confirm against the published tables; method ISO 14083:2023';
export const DEMO_EMISSION_FACTORS = [
	{ mode: 'air', gCo2ePerTonneKm: '560', source: GLEC },
	{ mode: 'sea_fcl', gCo2ePerTonneKm: '16', source: GLEC },
	{ mode: 'sea_lcl', gCo2ePerTonneKm: '19', source: GLEC },
	{ mode: 'road', gCo2ePerTonneKm: '85', source: GLEC },
	{ mode: 'courier', gCo2ePerTonneKm: '600', source: GLEC }
].map((f) => ({ ...f, validFrom: '2023-01-01', validTo: null }));

export const DEMO_SETTINGS = {
	insuranceRatePercent: '0.30',
	insuranceUpliftPercent: '10',
	minimumPremium: '25',
	insuranceSource:
		'Invented demo open-cover rate; 110 % of CIF insured as common practice (UCP 600 Art. 28(f)(ii))',
	carryingRatePercent: '8',
	allocation: 'value' as const,
	brokerage: {
		DE: [perShipment('Customs entry (broker)', '95', 'EUR')],
		AU: [perShipment('Customs entry (broker)', '120', 'AUD')],
		US: [perShipment('Entry filing (broker)', '135'), perShipment('ISF filing', '35')]
	}
};
