import { describe, expect, it } from 'vitest';
import type { Quantities } from './charges';
import { Context } from './context';
import { dec } from './decimal';
import { baseFreight, revenueTonnes } from './freight';
import { courierCard } from './test-fixtures';
import type { RateCard } from './types';

// Rates invented; the rules are common practice (see freight.ts).
const q = (over: Partial<Quantities> = {}): Quantities => ({
	grossKg: dec('800'),
	chargeableKg: dec('800'),
	revenueTonnes: dec('1'),
	pallets: 2,
	containers: [],
	...over
});
const price = (card: RateCard, quantities: Quantities) => {
	const ctx = new Context('2026-03-02');
	return { piece: baseFreight(card, quantities, ctx), ctx };
};
const base = courierCard();

describe('base freight per mode', () => {
	it('courier: 2.3 kg = 5 steps of 0.5 kg, first 40.00 + 4 × 6.50 = 66.00', () => {
		const card = courierCard({ firstHalfKg: '40.00', additionalHalfKg: '6.50' });
		expect(price(card, q({ chargeableKg: dec('2.3') })).piece?.amount.toFixed(2)).toBe('66.00');
	});
	it('sea groupage: weight or measure, 1 t = 1 m³, at least the minimum W/M', () => {
		expect(revenueTonnes(dec('800'), dec('2.5'), dec('1')).toString()).toBe('2.5');
		expect(revenueTonnes(dec('3200'), dec('2.5'), dec('1')).toString()).toBe('3.2');
		expect(revenueTonnes(dec('300'), dec('0.4'), dec('1')).toString()).toBe('1');
		const card: RateCard = {
			...base,
			mode: 'sea_lcl',
			ratePerWm: '48.00',
			minimumWm: '1',
			minimumCharge: '60.00'
		};
		expect(price(card, q({ revenueTonnes: dec('2.5') })).piece?.amount.toFixed(2)).toBe('120.00');
		expect(price(card, q({ revenueTonnes: dec('1') })).piece?.amount.toFixed(2)).toBe('60.00');
	});
	it('sea FCL: rate per container type; an unknown type is reported', () => {
		const card: RateCard = {
			...base,
			mode: 'sea_fcl',
			containerRates: [{ typeCode: '22G1', ratePerContainer: '1450.00' }]
		};
		const two = q({ containers: [{ typeCode: '22G1', count: 2 }] });
		expect(price(card, two).piece?.amount.toFixed(2)).toBe('2900.00');
		const { ctx } = price(card, q({ containers: [{ typeCode: '45G1', count: 1 }] }));
		expect(ctx.missing[0]?.message).toBe(
			'rate card rc-courier has no rate for container type 45G1'
		);
	});
	it('road: per pallet or per kg, with a minimum', () => {
		const road = (basis: 'per_kg' | 'per_pallet', rate: string): RateCard => ({
			...base,
			mode: 'road',
			basis,
			rate,
			minimumCharge: '150.00'
		});
		expect(price(road('per_pallet', '95.00'), q()).piece?.amount.toFixed(2)).toBe('190.00');
		expect(price(road('per_kg', '0.12'), q()).piece?.amount.toFixed(2)).toBe('150.00');
	});
});
