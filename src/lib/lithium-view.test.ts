import { describe, expect, it } from 'vitest';
import { productLithiumView, shipmentLithiumView } from './lithium-view';

// A 74 Wh lithium-ion power bank shipped on its own (invented demo figures). UN 3480 and IATA
// PI 965, cargo aircraft only, at most 30 % state of charge: IATA Dangerous Goods Regulations,
// 66th edition (2025), PI 965 and 2.3.5.9 (from memory); sea: IMDG Code, SP 188 (from memory).
const powerBank = {
	sku: 'PB-74',
	batteryConfig: 'standalone' as const,
	batteryChemistry: 'lithium_ion' as const,
	cellWh: '18.50',
	batteryWh: '74.00',
	cellsPerBattery: 4,
	batteriesPerUnit: 1
};

describe('lithium guidance rows', () => {
	it('shows a standalone lithium-ion battery per mode, cargo aircraft only by air', () => {
		const view = productLithiumView(powerBank)!;
		expect(view.rows.map((r) => r.label)).toEqual(['Air', 'Sea', 'Road']);
		expect(view.rows[0]!.unNumber).toMatch(/^UN ?3480/);
		expect(view.rows[0]!.detail).toMatch(/PI 965/);
		expect(view.rows[0]!.detail).toMatch(/cargo aircraft only/);
		expect(view.rows[0]!.detail).toMatch(/30 %/);
		expect(view.warnings.join(' ')).toMatch(/passenger aircraft/);
		expect(view.actions.some((a) => /UN38\.3/.test(a.text))).toBe(true);
		expect(view.caution).toMatch(/trained/);
	});

	it('has nothing to say of a product without a battery', () => {
		expect(productLithiumView({ sku: 'SPK', batteryConfig: 'none' })).toBeNull();
		expect(shipmentLithiumView([{ sku: 'SPK', batteryConfig: 'none' }], 'air')).toBeNull();
	});

	it('names the SKUs each shipment action is for', () => {
		const view = shipmentLithiumView([powerBank, { sku: 'SPK', batteryConfig: 'none' }], 'air')!;
		expect(view.rows.map((r) => r.label)).toEqual(['PB-74']);
		expect(view.actions.every((a) => a.skus.includes('PB-74'))).toBe(true);
		expect(view.warnings.join(' ')).toMatch(/cargo aircraft only/);
	});
});
