/**
 * Packing computation: cartons, pallets, chargeable weight and unit conversions for shipments.
 * Pure: no framework imports; quantities are decimal.js values or decimal strings.
 */
export {
	MM_PER_INCH,
	M_PER_FOOT,
	KG_PER_POUND,
	UNIT_SYSTEMS,
	DISPLAY_DECIMALS,
	inchesToMm,
	mmToInches,
	lbToKg,
	kgToLb,
	ft3ToM3,
	m3ToFt3,
	formatLength,
	formatMass,
	formatVolume,
	type DecimalInput,
	type FormatOptions,
	type UnitSystem
} from './units';
export {
	CHARGE_MODES,
	CHARGE_BASES,
	CHARGEABLE_RULES,
	chargeableRule,
	chargeableWeight,
	chargeableWeights,
	mmToNearestCm,
	type ChargeMode,
	type ChargeBasis,
	type ChargeableRule,
	type ChargeablePiece,
	type ChargeableWeight,
	type DensityFactorRule,
	type PerContainerRule,
	type VolumetricDivisorRule,
	type WeightOrMeasureRule
} from './chargeable';
export {
	ORIENTATIONS,
	checkCartonLine,
	checkPackaging,
	countCartons,
	packCartons,
	packCartonLines,
	type CartonGroup,
	type CartonLine,
	type CartonLineInput,
	type CartonLineResult,
	type CartonLinesResult,
	type CartonTotals,
	type Orientation,
	type Packaging
} from './cartons';
export {
	LAYER_SEARCH_BUDGET,
	layerPattern,
	layerRectangles,
	type LayerBlock,
	type LayerMethod,
	type LayerPattern
} from './layer-pattern';
export {
	palletSpecFromType,
	palletStowage,
	planPallets,
	type PalletCarton,
	type PalletError,
	type PalletFailure,
	type PalletGroup,
	type PalletLimit,
	type PalletPlan,
	type PalletPlanInput,
	type PalletPlanResult,
	type PalletSpec,
	type PalletStowage,
	type VerticalSide
} from './pallets';
export { MAX_COUNT, MAX_MM, type Problem } from './problem';
export {
	MAX_ENTRIES,
	measureInputSchema,
	measureResultSchema,
	packagingSchema,
	palletSpecSchema,
	productSchema,
	shipmentLineSchema,
	problemSchema,
	type MeasureInput,
	type PackagingInput,
	type PalletSpecInput,
	type ProductInput,
	type ShipmentLineInput
} from './schema';
export { measure, type MeasureResult, type MeasuredLine, type MeasuredPallets } from './measure';
