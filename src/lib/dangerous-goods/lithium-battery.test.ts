import { describe, expect, it } from 'vitest';
import {
	classifyLithiumBattery,
	LITHIUM_LIMITS,
	wattHours,
	type LithiumBatteryData
} from './lithium-battery';

const ion = (over: Partial<LithiumBatteryData> = {}): LithiumBatteryData => ({
	sku: 'PB-1',
	batteryConfig: 'standalone',
	batteryChemistry: 'lithium_ion',
	cellWh: '12.00',
	batteryWh: '74.00',
	cellsPerBattery: 6,
	...over
});
const metal = (over: Partial<LithiumBatteryData> = {}): LithiumBatteryData => ({
	sku: 'TAG-1',
	batteryConfig: 'contained',
	batteryChemistry: 'lithium_metal',
	cellLithiumG: '0.500',
	batteryLithiumG: '1.000',
	cellsPerBattery: 2,
	...over
});

describe('UN numbers and proper shipping names', () => {
	// UN Recommendations on the Transport of Dangerous Goods, Model Regulations, 3.2 Dangerous
	// Goods List: UN 3480 lithium ion batteries, UN 3481 … contained in / packed with equipment,
	// UN 3090 lithium metal batteries, UN 3091 … contained in / packed with equipment (from memory).
	it.each([
		['lithium_ion', 'standalone', 'UN3480', /^LITHIUM ION BATTERIES \(/],
		['lithium_ion', 'packed_with', 'UN3481', /^LITHIUM ION BATTERIES PACKED WITH EQUIPMENT/],
		['lithium_ion', 'contained', 'UN3481', /^LITHIUM ION BATTERIES CONTAINED IN EQUIPMENT/],
		['lithium_metal', 'standalone', 'UN3090', /^LITHIUM METAL BATTERIES \(/],
		['lithium_metal', 'packed_with', 'UN3091', /^LITHIUM METAL BATTERIES PACKED WITH EQUIPMENT/],
		['lithium_metal', 'contained', 'UN3091', /^LITHIUM METAL BATTERIES CONTAINED IN EQUIPMENT/]
	] as const)('%s %s → %s', (chemistry, config, un, psn) => {
		const c = classifyLithiumBattery(
			(chemistry === 'lithium_ion' ? ion : metal)({ batteryConfig: config })
		);
		expect(c?.unNumber).toBe(un);
		expect(c?.properShippingName).toMatch(psn);
		expect(c?.hazardClass).toBe('9');
	});

	it('has nothing to classify without a battery', () => {
		expect(classifyLithiumBattery({ batteryConfig: 'none' })).toBeNull();
	});
});

describe('watt-hours = V × Ah', () => {
	// UN Model Regulations, 2.9.4, and IATA DGR Appendix A: Watt-hour rating = nominal voltage ×
	// rated capacity in ampere-hours (from memory). Worked values checked by hand.
	it('computes exactly in decimals', () => {
		expect(wattHours('3.7', '2.6')).toBe('9.62');
		expect(wattHours('3.7', '27.027')).toBe('99.9999');
		expect(wattHours('7.2', '13.9')).toBe('100.08');
		// A float product would give 0.30000000000000004 here.
		expect(wattHours('0.1', '3')).toBe('0.3');
	});

	it('refuses nonsense', () => {
		expect(() => wattHours('0', '2')).toThrow(RangeError);
		expect(() => wattHours('-3.7', '2')).toThrow(RangeError);
	});

	it('is used when only voltage and capacity are stored', () => {
		const c = classifyLithiumBattery(
			ion({ batteryWh: null, nominalVoltage: '3.700', capacityAh: '27.0000', cellWh: '10.00' })
		);
		expect(c?.ratings).toMatchObject({ batteryWh: '99.9', batteryWhFromVoltage: true });
		expect(c?.withinSmallLimits).toBe(true);
		const over = classifyLithiumBattery(
			ion({ batteryWh: null, nominalVoltage: '7.2', capacityAh: '13.9', cellWh: '10' })
		);
		expect(over?.withinSmallLimits).toBe(false);
	});

	it('is not hidden by a stored rating rounded down to the limit', () => {
		// 3.7 V × 27.028 Ah = 100.0036 Wh, stored as 100.00 by rounding: above 100 Wh all the same.
		const c = classifyLithiumBattery(
			ion({ batteryWh: '100.00', nominalVoltage: '3.7', capacityAh: '27.028', cellWh: '10' })
		);
		expect(c?.ratings).toMatchObject({ batteryWh: '100.0036', batteryWhFromVoltage: true });
		expect(c?.withinSmallLimits).toBe(false);
		// A stored rating above V × Ah stands.
		const marked = classifyLithiumBattery(
			ion({ batteryWh: '99.00', nominalVoltage: '3.7', capacityAh: '26', cellWh: '10' })
		);
		expect(marked?.ratings).toMatchObject({ batteryWh: '99', batteryWhFromVoltage: false });
	});
});

describe('small-battery limits', () => {
	// IATA DGR 66th/67th ed., PI 966/967 Section II and IMDG Code / ADR SP 188: a lithium-ion
	// cell not exceeding 20 Wh, a battery not exceeding 100 Wh; PI 969/970 Section II and SP 188:
	// a lithium-metal cell not exceeding 1 g, a battery not exceeding 2 g of lithium (from
	// memory; also 49 CFR 173.185(c)(1)(i), seen through the search tool). "Not exceeding": the
	// limit itself is within, one hundredth above is not.
	it('publishes the limits', () => {
		expect(LITHIUM_LIMITS).toMatchObject({
			ionCellWh: '20',
			ionBatteryWh: '100',
			metalCellG: '1',
			metalBatteryG: '2',
			stateOfChargePercent: '30'
		});
	});

	it.each([
		['cell exactly 20 Wh', { cellWh: '20.00' }, true],
		['cell 20.01 Wh', { cellWh: '20.01' }, false],
		['battery exactly 100 Wh', { batteryWh: '100.00' }, true],
		['battery 100.01 Wh', { batteryWh: '100.01' }, false]
	] as const)('lithium-ion %s', (_name, over, within) => {
		expect(classifyLithiumBattery(ion(over))?.withinSmallLimits).toBe(within);
	});

	it.each([
		['cell exactly 1 g', { cellLithiumG: '1.000' }, true],
		['cell 1.01 g', { cellLithiumG: '1.010' }, false],
		['battery exactly 2 g', { batteryLithiumG: '2.000' }, true],
		['battery 2.01 g', { batteryLithiumG: '2.010' }, false]
	] as const)('lithium metal %s', (_name, over, within) => {
		expect(classifyLithiumBattery(metal(over))?.withinSmallLimits).toBe(within);
	});

	it('applies the cell limit to a single-cell battery', () => {
		// A single-cell battery is a cell (UN Manual of Tests and Criteria 38.3.2.3; from memory).
		const c = classifyLithiumBattery(ion({ cellWh: null, batteryWh: '20.01', cellsPerBattery: 1 }));
		expect(c?.limitChecks.map((l) => l.quantity)).toEqual(['cellWh']);
		expect(c?.withinSmallLimits).toBe(false);
	});

	it('cannot confirm the limits without the data, and says so', () => {
		const c = classifyLithiumBattery(ion({ cellWh: null }));
		expect(c?.withinSmallLimits).toBeNull();
		expect(c?.dataIssues.map((d) => d.field)).toEqual(['cellWh']);
		// One known breach is enough to decide.
		expect(classifyLithiumBattery(ion({ cellWh: null, batteryWh: '160' }))?.withinSmallLimits).toBe(
			false
		);
	});

	it('reports unreadable values and a missing chemistry', () => {
		const c = classifyLithiumBattery(ion({ batteryWh: 'lots', batteryChemistry: '' }));
		expect(c?.dataIssues.map((d) => d.field)).toEqual([
			'batteryChemistry',
			'batteryWh',
			'batteryWh'
		]);
		expect(c?.dataIssues[1]?.message).toContain('"lots"');
		expect(c?.chemistry).toBe('lithium_ion');
	});
});
