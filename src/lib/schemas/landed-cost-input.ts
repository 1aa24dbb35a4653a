/**
 * The body of POST /api/v1/calc/landed-cost: the engine's whole input (`LandedCostInput` in
 * src/lib/landed-cost/types.ts), field for field, so a client may send what
 * `shipmentLandedCostInput` builds (or its own figures) and get the same result. Shapes, formats
 * and sizes are checked here (400 with field paths); whether the data is complete and in force on
 * the date stays with the engine (422 with its `missing`).
 *
 * Pure module: no framework imports.
 */
import { z } from 'zod';
import type { LandedCostInput } from '../landed-cost/types';
import { CHARGE_MODES } from '../packing/chargeable';
import { INCOTERM_CODES } from '../trade/incoterms';
import { countryCode, currencyCode, decimalString, hsCode, positiveInt } from './fields';
import {
	chargeSchema,
	dutyRateSchema,
	rateCardTermsSchema,
	roundingRulesSchema
} from './landed-cost';

/** Most lines in one request (a shipment page holds up to this many as well). */
export const CALC_MAX_LINES = 1000;
/** Tariff rows of the destination in one request. */
export const CALC_MAX_TARIFF_ROWS = 2000;
export const CALC_MAX_EXCHANGE_RATES = 500;
/** Charges per list, fees, de minimis rules, air breaks, container rates and containers. */
export const CALC_MAX_LIST = 50;

// Amounts, rates, masses and volumes: up to 10 whole digits and 10 decimals, never negative.
const amount = (label: string) => decimalString(label, 10, 'zero');
const positive = (label: string) => decimalString(label, 10, 'positive');
const percent = (label: string, max = 100) =>
	amount(label).refine((v) => Number(v) <= max, `${label}: at most ${max} (percent).`);
const text = (label: string, max: number) =>
	z
		.string()
		.trim()
		.min(1, `${label}: 1 to ${max} characters.`)
		.max(max, `${label}: 1 to ${max} characters.`);
const count = (label: string, max: number) =>
	z
		.number({ error: `${label}: a whole number from 0 to ${max}.` })
		.int(`${label}: a whole number from 0 to ${max}.`)
		.min(0, `${label}: a whole number from 0 to ${max}.`)
		.max(max, `${label}: a whole number from 0 to ${max}.`);
const list = <T extends z.ZodType>(item: T, label: string, max = CALC_MAX_LIST) =>
	z.array(item).max(max, `${label}: at most ${max} entries.`);
const isoDate = z.iso.date('A date YYYY-MM-DD.');
const mode = z.enum(CHARGE_MODES, 'One of air, courier, sea_lcl, road, sea_fcl.');
/** A country (ISO 3166-1 alpha-2) or a UN/LOCODE (country + 3 characters) naming a lane end. */
const laneEnd = z
	.string()
	.trim()
	.toUpperCase()
	.refine(
		(v) => /^[A-Z]{2}([A-Z0-9]{3})?$/.test(v) && countryCode.safeParse(v.slice(0, 2)).success,
		'A country code (DE) or UN/LOCODE (DEHAM).'
	);

const referenceRow = {
	id: text('Row id', 100),
	source: text('Source', 500),
	validFrom: isoDate,
	validTo: isoDate.nullable()
};
/** A row's validTo is on or after its validFrom (ISO dates compare as strings). */
const datesInOrder = <T extends z.ZodType<{ validFrom: string; validTo: string | null }>>(row: T) =>
	row.refine((r) => r.validTo === null || r.validTo >= r.validFrom, {
		message: 'validTo: on or after validFrom.',
		path: ['validTo']
	});

/** A charge as in rate-card terms (schemas/landed-cost.ts), its currency an ISO 4217 code. */
export const calcChargeSchema = z.strictObject({
	...chargeSchema.shape,
	label: text('Label', 100),
	amount: amount('Amount'),
	currency: currencyCode,
	containerType: text('Container type', 10).optional(),
	minimum: amount('Minimum').optional()
});
const charges = (label: string) => list(calcChargeSchema, label);

// The rate card: the reference row and the columns, plus the mode's terms (the jsonb of
// rate_cards, schemas/landed-cost.ts) with checked currencies and bounded lists.
const cardBase = {
	...referenceRow,
	laneFrom: laneEnd,
	laneTo: laneEnd,
	currency: currencyCode,
	transitDays: count('Transit days', 365),
	distanceKm: positive('Distance km').nullable(),
	surcharges: charges('Surcharges'),
	originCharges: charges('Origin charges'),
	destinationCharges: charges('Destination charges')
};
const [air, seaFcl, seaLcl, road, courier] = rateCardTermsSchema.options;
export const calcRateCardSchema = z.discriminatedUnion('mode', [
	datesInOrder(
		z.strictObject({
			...air.shape,
			...cardBase,
			breaks: list(
				z.strictObject({ fromKg: amount('Break kg'), ratePerKg: amount('Rate per kg') }),
				'Breaks'
			).min(1, 'Breaks: at least one.')
		})
	),
	datesInOrder(
		z.strictObject({
			...seaFcl.shape,
			...cardBase,
			containerRates: list(
				z.strictObject({
					typeCode: text('Container type', 10),
					ratePerContainer: amount('Rate per container')
				}),
				'Container rates'
			).min(1, 'Container rates: at least one.')
		})
	),
	datesInOrder(z.strictObject({ ...seaLcl.shape, ...cardBase })),
	datesInOrder(z.strictObject({ ...road.shape, ...cardBase })),
	datesInOrder(z.strictObject({ ...courier.shape, ...cardBase }))
]);

const hsPrefix = z.string().regex(/^\d{2,10}$/, 'HS prefix: 2 to 10 digits.');

export const calcTariffRowSchema = datesInOrder(
	z.strictObject({
		...referenceRow,
		destinationCountry: countryCode,
		hsPrefix,
		agreement: text('Agreement', 40).nullable(),
		originCountries: list(countryCode, 'Origin countries', 300).nullable(),
		duty: dutyRateSchema.refine(
			(d) => d.kind === 'ad_valorem' || currencyCode.safeParse(d.currency).success,
			{ message: 'An ISO 4217 currency code such as USD or EUR.', path: ['currency'] }
		)
	})
);

const feeSchema = datesInOrder(
	z.strictObject({
		...referenceRow,
		code: z.string().regex(/^[A-Z0-9-]{2,20}$/, 'Fee code: 2 to 20 of A-Z, 0-9 and -.'),
		label: text('Label', 100),
		kind: z.enum(['ad_valorem', 'fixed']),
		ratePercent: percent('Fee rate').nullable(),
		amount: amount('Fee amount').nullable(),
		base: z.literal('customs_value'),
		min: amount('Minimum').nullable(),
		max: amount('Maximum').nullable(),
		modes: list(mode, 'Modes', CHARGE_MODES.length).nullable()
	})
).refine((f) => (f.kind === 'ad_valorem' ? f.ratePercent !== null : f.amount !== null), {
	message: 'An ad valorem fee needs ratePercent; a fixed fee needs amount.',
	path: ['kind']
});

const deMinimisSchema = datesInOrder(
	z.strictObject({
		...referenceRow,
		dutyUpTo: amount('Duty relief up to').nullable(),
		vatUpTo: amount('VAT relief up to').nullable(),
		currency: currencyCode
	})
);

export const calcCountryRulesSchema = datesInOrder(
	z.strictObject({
		...referenceRow,
		country: countryCode,
		currency: currencyCode,
		valuationBasis: z.enum(['CIF', 'FOB']),
		vat: z.strictObject({
			label: text('VAT label', 20),
			ratePercent: percent('VAT rate'),
			reduced: list(
				z.strictObject({ hsPrefix, ratePercent: percent('Reduced rate') }),
				'Reduced rates',
				500
			),
			baseIncludes: list(
				z.enum(['duty', 'fees', 'freight', 'insurance', 'origin_charges', 'destination_charges']),
				'VAT base',
				6
			)
		}),
		rounding: roundingRulesSchema,
		fees: list(feeSchema, 'Fees'),
		deMinimis: list(deMinimisSchema, 'De minimis rules')
	})
);

const exchangeRateSchema = datesInOrder(
	z.strictObject({
		...referenceRow,
		base: currencyCode,
		quote: currencyCode,
		rate: positive('Exchange rate')
	})
).refine((r) => r.base !== r.quote, { message: 'quote: not the same as base.', path: ['quote'] });

export const calcLineSchema = z.strictObject({
	ref: text('Line reference', 100),
	sku: text('SKU', 100),
	hsCode,
	originCountry: countryCode,
	quantity: positiveInt('Quantity', 1_000_000_000),
	unitPrice: amount('Unit price'),
	netKg: amount('Net kg'),
	grossKg: amount('Gross kg')
});

export const landedCostInputSchema = z.strictObject({
	date: isoDate,
	mode,
	reportCurrency: currencyCode,
	incoterm: z.enum(INCOTERM_CODES, 'An Incoterms 2020 rule such as FCA or DAP.'),
	originCountry: countryCode,
	destinationCountry: countryCode,
	goodsCurrency: currencyCode,
	lines: list(calcLineSchema, 'Lines', CALC_MAX_LINES).min(1, 'Lines: at least one.'),
	measures: z.strictObject({
		grossKg: amount('Gross kg'),
		volumeM3: amount('Volume m³'),
		chargeableKg: amount('Chargeable kg'),
		pallets: count('Pallets', 100_000),
		containers: list(
			z.strictObject({
				typeCode: text('Container type', 10),
				count: positiveInt('Containers', 1000)
			}),
			'Containers'
		)
	}),
	rateCard: calcRateCardSchema.nullable(),
	tariffRows: list(calcTariffRowSchema, 'Tariff rows', CALC_MAX_TARIFF_ROWS),
	preferenceClaimed: z.boolean('true or false.'),
	country: calcCountryRulesSchema.nullable(),
	exchangeRates: list(exchangeRateSchema, 'Exchange rates', CALC_MAX_EXCHANGE_RATES),
	insurance: z.strictObject({
		ratePercent: percent('Insurance rate'),
		upliftPercent: percent('Uplift', 1000),
		minimumPremium: amount('Minimum premium').nullable(),
		source: text('Source', 500)
	}),
	allocation: z.enum(['weight', 'value']),
	brokerage: charges('Brokerage'),
	carryingRatePercent: percent('Carrying rate'),
	emissionFactor: datesInOrder(
		z.strictObject({ ...referenceRow, gCo2ePerTonneKm: positive('g CO2e per tonne-km') })
	).nullable(),
	distanceKm: positive('Distance km').nullable()
});

// Compile-time: what the schema accepts is exactly the engine's input, both ways.
type Assignable<T extends U, U> = T;
export type CalcLandedCostInput = Assignable<
	z.output<typeof landedCostInputSchema>,
	LandedCostInput
>;
export type CalcLandedCostBody = Assignable<LandedCostInput, z.input<typeof landedCostInputSchema>>;
