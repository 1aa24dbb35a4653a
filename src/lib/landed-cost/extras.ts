/**
 * Figures beside the landed cost: the carrying cost of goods in transit (value × annual rate ×
 * days / 365, common practice; finance sets the rate) and transport emissions by ISO 14083:2023
 * with a GLEC Framework default intensity factor: kg CO2e = tonnes × km × g CO2e per tonne-km /
 * 1000. Factor, source and distance are data.
 */
import type Decimal from 'decimal.js';
import { Exact, percent, roundMinor } from './decimal';

const DAYS_PER_YEAR = new Exact(365);
const THOUSAND = new Exact(1000);

export function carryingCost(
	value: Decimal,
	annualRatePercent: string,
	days: number,
	currency: string
): Decimal {
	return roundMinor(
		value.times(percent(annualRatePercent)).times(days).dividedBy(DAYS_PER_YEAR),
		currency
	);
}

/** kg CO2e to 3 decimals (gram precision), half up. */
export function emissionsKg(grossKg: Decimal, distanceKm: Decimal, gPerTonneKm: Decimal): Decimal {
	return grossKg
		.dividedBy(THOUSAND)
		.times(distanceKm)
		.times(gPerTonneKm)
		.dividedBy(THOUSAND)
		.toDecimalPlaces(3);
}
