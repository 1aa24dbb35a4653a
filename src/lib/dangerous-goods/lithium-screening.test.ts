import { describe, expect, it } from 'vitest';
import { DANGEROUS_GOODS_CAUTION } from './caution';
import type { LithiumBatteryData } from './lithium-battery';
import { IMDG_LITHIUM_SPECIAL_PROVISIONS } from './lithium-sea-road';
import { screenLithiumProduct } from './lithium-screening';
import { summariseLithiumShipment } from './lithium-shipment';

const ON = { onDate: '2026-12-02' };
const powerBank: LithiumBatteryData & { sku: string } = {
	sku: 'PB-20K',
	batteryConfig: 'standalone',
	batteryChemistry: 'lithium_ion',
	cellWh: '18.50',
	batteryWh: '74.00',
	cellsPerBattery: 4
};
const headset: LithiumBatteryData & { sku: string } = {
	sku: 'HS-200',
	batteryConfig: 'contained',
	batteryChemistry: 'lithium_ion',
	nominalVoltage: '3.7',
	capacityAh: '0.5',
	cellsPerBattery: 1
};
const tracker: LithiumBatteryData & { sku: string } = {
	sku: 'TR-9',
	batteryConfig: 'packed_with',
	batteryChemistry: 'lithium_metal',
	cellLithiumG: '0.650',
	batteryLithiumG: '1.300',
	cellsPerBattery: 2
};
const cable: LithiumBatteryData & { sku: string } = { sku: 'CB-1', batteryConfig: 'none' };

describe('screenLithiumProduct', () => {
	it('leaves a product without a battery unrestricted', () => {
		const s = screenLithiumProduct(cable, 'air', ON);
		expect(s).toMatchObject({
			regime: 'not_restricted',
			un383SummaryRequired: false,
			requirements: []
		});
		expect(s.caution).toBe(DANGEROUS_GOODS_CAUTION);
	});

	it('always asks for the UN38.3 test summary for a lithium battery', () => {
		// UN Manual of Tests and Criteria, Part III, 38.3 and 38.3.5; UN Model Regulations 2.9.4 (g)
		// (from memory): every mode.
		for (const mode of ['air', 'courier', 'sea_fcl', 'sea_lcl', 'road'] as const) {
			const s = screenLithiumProduct(headset, mode, ON);
			expect(s.un383SummaryRequired).toBe(true);
			const r = s.requirements.find((x) => x.id === 'un383_summary');
			expect(r?.source.section).toMatch(/2\.9\.4 \(g\)/);
			expect(s.requirements.find((x) => x.id === 'un383_tests')?.source.section).toMatch(
				/Part III, subsection 38\.3.*38\.3\.5/
			);
		}
	});

	it('screens a power bank by air as fully regulated, cargo aircraft only', () => {
		const s = screenLithiumProduct(powerBank, 'air', ON);
		expect(s.regime).toBe('fully_regulated');
		expect(s.air).toMatchObject({
			packingInstruction: '965',
			section: 'IB',
			cargoAircraftOnly: true
		});
		expect(s.forbiddenOnPassengerAircraft).toBe(true);
		expect(s.surface).toBeNull();
	});

	it('computes a headset’s watt-hours from V × Ah and allows Section II', () => {
		// 3.7 V × 0.5 Ah = 1.85 Wh ≤ 20 Wh (a single-cell battery is a cell).
		const s = screenLithiumProduct(headset, 'air', ON);
		expect(s.classification?.ratings).toMatchObject({ batteryWh: '1.85', cellWh: '1.85' });
		expect(s.regime).toBe('reduced');
		expect(s.air?.section).toBe('II');
	});

	it('uses the IMDG Code by sea and ADR by road', () => {
		// IMDG Code Amendment 42-24 and ADR 2025, special provision 188 (from memory).
		const sea = screenLithiumProduct(tracker, 'sea_fcl', ON);
		expect(sea.surface).toMatchObject({
			code: 'IMDG',
			regime: 'sp188',
			packingInstruction: 'P903'
		});
		expect(sea.regime).toBe('reduced');
		expect(sea.requirements.map((r) => r.id)).toContain('sea_mark');
		const big = screenLithiumProduct({ ...tracker, batteryLithiumG: '2.01' }, 'sea_lcl', ON);
		expect(big.surface?.regime).toBe('class9');
		expect(big.requirements.map((r) => r.id)).toEqual(
			expect.arrayContaining(['sea_class9', 'sea_documents'])
		);
		const road = screenLithiumProduct(powerBank, 'road', ON);
		expect(road.surface).toMatchObject({ code: 'ADR', regime: 'sp188' });
		expect(road.requirements[0]?.source.document).toMatch(/^ADR 2025/);
	});

	it('lists the IMDG special provisions on these entries', () => {
		// IMDG Code Amendment 42-24, 3.2 Dangerous Goods List, UN 3090/3091/3480/3481 column 6
		// (from memory): 188, 230, 310, 348, 360, 376, 377.
		expect(IMDG_LITHIUM_SPECIAL_PROVISIONS.map((p) => p.number)).toEqual([
			'188',
			'230',
			'310',
			'348',
			'360',
			'376',
			'377'
		]);
		expect(IMDG_LITHIUM_SPECIAL_PROVISIONS[0]?.summary).toMatch(/20 Wh.*100 Wh.*1 g.*2 g/);
	});

	it('assumes full regulation and asks for the data when it is missing', () => {
		const s = screenLithiumProduct({ ...headset, nominalVoltage: null }, 'sea_fcl', ON);
		expect(s.regime).toBe('fully_regulated');
		expect(s.requirements[0]?.id).toBe('data_cellWh');
	});
});

describe('summariseLithiumShipment', () => {
	const lines = [cable, headset, powerBank, { ...headset }].map((product) => ({ product }));

	it('takes the worst line and says whether anything is barred from passenger aircraft', () => {
		const s = summariseLithiumShipment(lines, 'air', ON);
		expect(s.worst).toBe('fully_regulated');
		expect(s.forbiddenOnPassengerAircraft).toBe(true);
		expect(s.un383SummaryBySku).toEqual({ 'CB-1': false, 'HS-200': true, 'PB-20K': true });
		expect(s.caution).toBe(DANGEROUS_GOODS_CAUTION);
		const headsetOnly = summariseLithiumShipment([{ product: headset }], 'air', ON);
		expect(headsetOnly).toMatchObject({ worst: 'reduced', forbiddenOnPassengerAircraft: false });
		expect(summariseLithiumShipment([{ product: cable }], 'road', ON).worst).toBe('not_restricted');
	});

	it('lists each action once with the SKUs it concerns', () => {
		const s = summariseLithiumShipment(lines, 'air', ON);
		const un383 = s.actions.filter((a) => a.id === 'un383_summary');
		expect(un383).toHaveLength(1);
		expect(un383[0]?.skus).toEqual(['HS-200', 'PB-20K']);
		expect(s.actions.find((a) => a.id === 'air_cargo_aircraft_only')?.skus).toEqual(['PB-20K']);
		expect(s.actions.find((a) => a.id === 'air_soc_required')?.skus).toEqual(['PB-20K']);
		expect(s.actions.every((a) => a.action)).toBe(true);
	});

	it('keeps actions apart when their rules differ', () => {
		const packed = {
			...headset,
			sku: 'HS-KIT',
			batteryConfig: 'packed_with' as const,
			cellWh: '10',
			batteryWh: '10'
		};
		const s = summariseLithiumShipment([{ product: powerBank }, { product: packed }], 'air', ON);
		const soc = s.actions.filter((a) => a.id === 'air_soc_required');
		expect(soc.map((a) => [a.skus, a.source.basis])).toEqual([
			[['PB-20K'], 'from memory'],
			[['HS-KIT'], 'secondary source']
		]);
		expect(soc[1]?.text).toMatch(/^PI 966:/);
	});

	it('names the lines with incomplete data', () => {
		const s = summariseLithiumShipment(
			[{ product: { ...powerBank, cellWh: null } }, { product: headset }],
			'sea_fcl',
			ON
		);
		expect(s.incompleteSkus).toEqual(['PB-20K']);
		expect(s.worst).toBe('fully_regulated');
	});
});

describe('caution', () => {
	it('says Landfall prepares no declaration and defers to trained staff and the rules', () => {
		expect(DANGEROUS_GOODS_CAUTION).toMatch(/prepares no dangerous-goods declaration/);
		expect(DANGEROUS_GOODS_CAUTION).toMatch(/trained/);
		expect(DANGEROUS_GOODS_CAUTION).toMatch(/IATA Dangerous Goods Regulations.*IMDG Code.*carrier/);
	});
});
