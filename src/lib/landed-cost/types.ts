/**
 * Input and result of the landed-cost engine (`landedCost(input)`), as plain JSON-able data.
 *
 * Conventions, so that the database, the services and the API can produce and store these as is:
 * - Amounts, rates, masses and volumes are decimal strings ('1274.00', '0.3464', '318.5'); never
 *   JS numbers (the engine computes with decimal.js). Counts (quantity, pallets, days) are
 *   whole JS numbers.
 * - Dates are ISO 'YYYY-MM-DD'; currencies ISO 4217 codes; countries ISO 3166-1 alpha-2 codes;
 *   HS codes digits only ('85183000'); transport modes as in the packing module.
 * - Percentages are written as percent ('10' means 10 %), never as fractions.
 * - Every reference row (rate card, tariff row, country rules, fee, exchange rate, de minimis
 *   rule, emission factor) carries `ReferenceRow`: its id (for the trail), where it came from and
 *   the dates it is valid. A row is used on `input.date` only when validFrom ≤ date ≤ validTo
 *   (validTo null = open-ended); otherwise the result reports it as expired or missing.
 *
 * Pure module: types only, no framework imports.
 */
import type { ChargeMode } from '../packing/chargeable';
import type { IncotermCode } from '../trade/incoterms';

/** A decimal number written as a string, e.g. '1400.00' or '0.3464'. */
export type DecimalString = string;
/** 'YYYY-MM-DD'. */
export type IsoDate = string;
/** The five transport modes, the same as the packing module's chargeable-weight modes. */
export type TransportMode = ChargeMode;

/** What every reference row carries, so each figure can name the row and source it came from. */
export interface ReferenceRow {
	id: string;
	/** Issuer, document and section, or "common practice"/"from memory", or a quote reference. */
	source: string;
	validFrom: IsoDate;
	/** Last day the row applies (inclusive); null when open-ended. */
	validTo: IsoDate | null;
}

/** An amount in a currency. */
export interface Amount {
	amount: DecimalString;
	currency: string;
}

// ---------------------------------------------------------------- charges and rate cards

/**
 * How a charge's `amount` is multiplied:
 * per_shipment × 1; per_kg × gross kg; per_chargeable_kg × chargeable kg (this mode);
 * per_container × containers (of `containerType` when set, else all); per_wm × revenue tonnes
 * (weight or measure); per_pallet × pallets; percent_of_freight: `amount` is a percentage of the
 * base freight (the card's freight before surcharges), and `currency` is ignored.
 */
export type ChargeBasis =
	| 'per_shipment'
	| 'per_kg'
	| 'per_chargeable_kg'
	| 'per_container'
	| 'per_wm'
	| 'per_pallet'
	| 'percent_of_freight';

export interface Charge {
	label: string;
	basis: ChargeBasis;
	amount: DecimalString;
	currency: string;
	/** Only with basis per_container: the ISO 6346 size-type or plan code it applies to. */
	containerType?: string;
	/** The charge is at least this (same currency), e.g. a minimum documentation fee. */
	minimum?: DecimalString;
}

/** One air weight break: `ratePerKg` applies from `fromKg` chargeable kg ('0' = under 45 kg). */
export interface AirBreak {
	fromKg: DecimalString;
	ratePerKg: DecimalString;
}

/** Fields every rate card has, whatever its mode. */
export interface RateCardBase extends ReferenceRow {
	/** Lane, e.g. UN/LOCODEs 'MYPKG' → 'AUSYD', or country codes; shown in the trail. */
	laneFrom: string;
	laneTo: string;
	/** The currency of the card's rates (each Charge still names its own currency). */
	currency: string;
	transitDays: number;
	/** Lane distance in km for this mode, used for emissions when the input gives none. */
	distanceKm: DecimalString | null;
	/** Added to the base freight (fuel, security, bunker, peak season...). */
	surcharges: Charge[];
	/** Charges at origin (export clearance, origin terminal handling, pick-up). */
	originCharges: Charge[];
	/** Charges at destination (destination terminal handling, delivery, ...), not brokerage. */
	destinationCharges: Charge[];
}

/**
 * Air: per chargeable kg with weight breaks and a minimum charge. The break the weight falls in
 * applies, or a higher break charged at that break's weight when that is cheaper (common
 * practice); never below `minimumCharge`.
 */
export interface AirRateCard extends RateCardBase {
	mode: 'air';
	minimumCharge: DecimalString;
	/** Typically from 0 (under 45), 45, 100, 300, 500, 1000 kg; any order. */
	breaks: AirBreak[];
}

/** Sea full container load: a rate per container type (terminal handling goes in the charges). */
export interface SeaFclRateCard extends RateCardBase {
	mode: 'sea_fcl';
	containerRates: { typeCode: string; ratePerContainer: DecimalString }[];
}

/** Sea groupage: per revenue tonne (1 t = 1 m³, common practice) with a minimum charge. */
export interface SeaLclRateCard extends RateCardBase {
	mode: 'sea_lcl';
	ratePerWm: DecimalString;
	/** Revenue tonnes are at least this, commonly '1'. */
	minimumWm: DecimalString;
	minimumCharge: DecimalString;
}

/** Road: per chargeable kg or per pallet, with a minimum charge. */
export interface RoadRateCard extends RateCardBase {
	mode: 'road';
	basis: 'per_kg' | 'per_pallet';
	rate: DecimalString;
	minimumCharge: DecimalString;
}

/** Courier: chargeable kg in 0.5 kg steps; the first step at one price, each further step another. */
export interface CourierRateCard extends RateCardBase {
	mode: 'courier';
	firstHalfKg: DecimalString;
	additionalHalfKg: DecimalString;
}

export type RateCard =
	AirRateCard | SeaFclRateCard | SeaLclRateCard | RoadRateCard | CourierRateCard;

// ---------------------------------------------------------------- tariff and country rules

/** Duty per line: ad valorem on the line's customs value, specific per unit or per net kg, or both. */
export type DutyRate =
	| { kind: 'ad_valorem'; ratePercent: DecimalString }
	| { kind: 'specific'; amount: DecimalString; per: 'unit' | 'kg'; currency: string }
	| {
			kind: 'compound';
			ratePercent: DecimalString;
			amount: DecimalString;
			per: 'unit' | 'kg';
			currency: string;
	  };

/**
 * One tariff row of the destination. The engine takes, per line, the row whose `hsPrefix` is the
 * longest prefix of the line's HS code. Rows with `agreement` null are the general (MFN) rate;
 * rows with an agreement are preferential and apply only when the input claims a proof of
 * origin and the line's origin is in `originCountries`.
 */
export interface TariffRow extends ReferenceRow {
	destinationCountry: string;
	/** Digits, 2 to 10 long, e.g. '8518' or '85183000'. */
	hsPrefix: string;
	/** Trade agreement code (e.g. 'MAFTA'), null for the general rate. */
	agreement: string | null;
	/** Origins the preferential rate is for; null = any origin (the general rate). */
	originCountries: string[] | null;
	duty: DutyRate;
}

/** Rounding a base or an amount to a multiple, e.g. { multiple: '1', mode: 'down' } (whole units). */
export interface RoundingRule {
	multiple: DecimalString;
	mode: 'down' | 'half_up' | 'up';
}

/** What the import VAT/GST base adds to the customs value (anything already in it is not doubled). */
export type VatBaseItem =
	'duty' | 'fees' | 'freight' | 'insurance' | 'origin_charges' | 'destination_charges';

/** A customs fee, e.g. the US merchandise processing fee or harbor maintenance fee. */
export interface Fee extends ReferenceRow {
	/** Stable code, e.g. 'US-MPF'; rows with the same code are the fee's yearly versions. */
	code: string;
	label: string;
	kind: 'ad_valorem' | 'fixed';
	/** ad_valorem: percent of the base. */
	ratePercent: DecimalString | null;
	/** fixed: the amount. */
	amount: DecimalString | null;
	/** Base of an ad valorem fee; customs_value is in the country's currency. */
	base: 'customs_value';
	/** Bounds in the country's currency, or null. */
	min: DecimalString | null;
	max: DecimalString | null;
	/** Only charged for these modes (HMF: sea only); null = every mode. */
	modes: TransportMode[] | null;
}

/** Relief below a value, in force between its dates (e.g. US $800, suspended from 2025-08-29). */
export interface DeMinimisRule extends ReferenceRow {
	/** No duty when the shipment's customs value is at most this; null = no duty relief. */
	dutyUpTo: DecimalString | null;
	/** No import VAT/GST when the customs value is at most this; null = no VAT relief. */
	vatUpTo: DecimalString | null;
	currency: string;
}

/** Import rules of the destination country. Customs figures are computed in `currency`. */
export interface CountryRules extends ReferenceRow {
	country: string;
	/** The currency duty and taxes are assessed and paid in, e.g. 'AUD'. */
	currency: string;
	/** CIF: freight, insurance and loading costs to the border are in the customs value. */
	valuationBasis: 'CIF' | 'FOB';
	vat: {
		/** 'VAT', 'GST', ... for labels. */
		label: string;
		ratePercent: DecimalString;
		/** Reduced rates by HS prefix (longest prefix wins), if any. */
		reduced: { hsPrefix: string; ratePercent: DecimalString }[];
		baseIncludes: VatBaseItem[];
	};
	/** The country's own rounding; when absent, half-up to the currency's minor unit. */
	rounding: {
		dutyBase?: RoundingRule;
		duty?: RoundingRule;
		vatBase?: RoundingRule;
		vat?: RoundingRule;
	};
	fees: Fee[];
	/** All de minimis rules with their dates; the one in force on the date applies. */
	deMinimis: DeMinimisRule[];
}

// ---------------------------------------------------------------- other reference data

/** 1 `base` = `rate` `quote`, valid between its dates; its date in the trail is `validFrom`. */
export interface ExchangeRate extends ReferenceRow {
	base: string;
	quote: string;
	rate: DecimalString;
}

/** Emission intensity for the mode (ISO 14083:2023; GLEC Framework default factors). */
export interface EmissionFactor extends ReferenceRow {
	gCo2ePerTonneKm: DecimalString;
}

/** Cargo insurance terms (finance or the broker sets them). */
export interface InsuranceTerms {
	/** Premium rate in percent of the insured value, e.g. '0.35'. */
	ratePercent: DecimalString;
	/** Uplift over CIF for the insured value, '10' as is common practice (110 %). */
	upliftPercent: DecimalString;
	/** Smallest premium charged, in the report currency, or null. */
	minimumPremium: DecimalString | null;
	source: string;
}

// ---------------------------------------------------------------- the input

export interface LandedCostLine {
	/** The shipment line's own reference (id or line number), echoed in the result. */
	ref: string;
	sku: string;
	hsCode: string;
	originCountry: string;
	/** Whole units. */
	quantity: number;
	/** Price of one unit in `goodsCurrency`, goods only (no freight or insurance in it). */
	unitPrice: DecimalString;
	/** Net and gross kg of the whole line (all its units), not per unit. */
	netKg: DecimalString;
	grossKg: DecimalString;
}

/** The shipment's measures for the chosen mode, as the packing module and load plan give them. */
export interface LandedCostMeasures {
	grossKg: DecimalString;
	volumeM3: DecimalString;
	/** Chargeable kg for this mode, already computed by the packing module. */
	chargeableKg: DecimalString;
	pallets: number;
	/** From the load plan (sea_fcl); empty for other modes. */
	containers: { typeCode: string; count: number }[];
}

export interface LandedCostInput {
	/** The date the estimate is for: picks exchange rates, tariff rows, fees and de minimis. */
	date: IsoDate;
	mode: TransportMode;
	reportCurrency: string;
	incoterm: IncotermCode;
	originCountry: string;
	destinationCountry: string;
	goodsCurrency: string;
	lines: LandedCostLine[];
	measures: LandedCostMeasures;
	/** The card for this lane and mode, or null when there is none (reported as missing). */
	rateCard: RateCard | null;
	/** All tariff rows for the destination; the engine picks per line. */
	tariffRows: TariffRow[];
	/** True when a proof of origin is claimed, so preferential rows may apply. */
	preferenceClaimed: boolean;
	country: CountryRules | null;
	/** Rates for the pairs needed; either direction of a pair is used (inverse = 1 / rate). */
	exchangeRates: ExchangeRate[];
	insurance: InsuranceTerms;
	/** How freight, insurance and charges are shared out over the lines. */
	allocation: 'weight' | 'value';
	/** Customs brokerage charges (the importer's broker). */
	brokerage: Charge[];
	/** Annual rate in percent for the cost of money tied up in transit, set by finance. */
	carryingRatePercent: DecimalString;
	emissionFactor: EmissionFactor | null;
	/** Lane distance for the mode; null = the rate card's distanceKm. */
	distanceKm: DecimalString | null;
}

// ---------------------------------------------------------------- the result

export type Party = 'seller' | 'buyer';

/** The cost components that add up to `total`, in this order. */
export const COST_KEYS = [
	'goods',
	'originCharges',
	'freight',
	'insurance',
	'duty',
	'vat',
	'fees',
	'brokerage',
	'destinationCharges'
] as const;
export type CostKey = (typeof COST_KEYS)[number];

/** One component in the report currency, who bears it, and its amount in customs currency. */
export interface ComponentFigure {
	amount: DecimalString;
	currency: string;
	bearer: Party;
	/** Duty, VAT, fees: the amount as assessed in the destination's currency. */
	assessed?: Amount;
}

/** The report currency amount split over a line's units so that it adds back exactly. */
export interface UnitSplit {
	/** Cost of one unit. */
	amount: DecimalString;
	/** How many of the line's units carry this amount. */
	units: number;
}

export interface LineCost {
	ref: string;
	sku: string;
	quantity: number;
	hsCode: string;
	/** The tariff row whose rate the line paid. */
	tariffRowId: string;
	customsValue: Amount;
	/** This line's share of every component, in the report currency; each sums to the total. */
	shares: Record<CostKey, DecimalString>;
	/** The line's landed cost (sum of its shares). */
	total: DecimalString;
	/**
	 * Per-unit cost, largest-remainder split: e.g. 97 units at 12.34 and 3 at 12.35, so
	 * Σ amount × units is exactly `total` (at most two entries).
	 */
	perUnit: UnitSplit[];
}

/** One figure of the calculation, with how it was reached and where its data came from. */
export interface TrailStep {
	key: string;
	label: string;
	amount: DecimalString;
	currency: string;
	/** In words, e.g. 'max(minimum 85.00, 312 kg × 3.10 at the 300 kg break)'. */
	formula: string;
	inputs: { label: string; value: string }[];
	rowId?: string;
	source?: string;
}

/** A reference row the result used, with its dates. */
export interface DataUsed {
	kind: 'rate_card' | 'tariff' | 'country' | 'fee' | 'exchange_rate' | 'de_minimis' | 'emission';
	id: string;
	source: string;
	validFrom: IsoDate;
	validTo: IsoDate | null;
}

export interface LandedCostOk {
	ok: true;
	date: IsoDate;
	mode: TransportMode;
	incoterm: IncotermCode;
	reportCurrency: string;
	/** Customs currency of the destination (duty, VAT and fees are assessed in it). */
	customsCurrency: string;
	components: Record<CostKey, ComponentFigure>;
	/** Customs value (not a cost; the duty base), in report and customs currency. */
	customsValue: { amount: DecimalString; currency: string; assessed: Amount };
	/** Σ of all components. */
	total: Amount;
	/** Σ of the components the seller bears (what a C or D price must cover besides the goods). */
	sellerCosts: Amount;
	/** Goods value + Σ of the components the buyer bears. */
	landedCostToBuyer: Amount;
	perLine: LineCost[];
	transitDays: number;
	/** Goods value × annual rate × transit days / 365; not in `total`. */
	carryingCost: Amount;
	/** kg CO2e for the main carriage; null when no emission factor was given. */
	emissionsKgCo2e: DecimalString | null;
	asOf: { date: IsoDate; data: DataUsed[] };
	cautions: string[];
	trail: TrailStep[];
}

/** What is missing, expired or malformed, by input path ('rateCard', 'lines[3].hsCode', ...). */
export interface Missing {
	path: string;
	message: string;
}

export interface LandedCostFailure {
	ok: false;
	missing: Missing[];
}

export type LandedCostResult = LandedCostOk | LandedCostFailure;
