import { describe, expect, it } from 'vitest';
import { chooseAirBreak } from './air-breaks';
import { dec } from './decimal';

// Invented rate card (numbers made up for the tests); breaks as the trade writes them: minimum,
// under 45 kg, 45, 100, 300, 500, 1000 kg. The rule "a higher break applies when it is cheaper"
// is common practice in air cargo rating.
const BREAKS = [
	{ fromKg: '1000', ratePerKg: '2.30' },
	{ fromKg: '0', ratePerKg: '5.00' },
	{ fromKg: '45', ratePerKg: '4.20' },
	{ fromKg: '100', ratePerKg: '3.60' },
	{ fromKg: '300', ratePerKg: '3.10' },
	{ fromKg: '500', ratePerKg: '2.60' }
];
const MIN = dec('85.00');
const pick = (kg: string) => chooseAirBreak(dec(kg), BREAKS, MIN)!;

describe('air weight breaks (invented numbers)', () => {
	it('312 kg stays in the 300 kg break: 312 × 3.10 = 967.20', () => {
		const c = pick('312');
		expect(c.charge.toFixed(2)).toBe('967.20');
		expect(c.fromKg.toString()).toBe('300');
		expect(c.ownBreak).toBeNull();
	});
	it('450 kg is cheaper charged as 500 kg × 2.60 = 1300.00 than 450 × 3.10 = 1395.00', () => {
		const c = pick('450');
		expect(c.charge.toFixed(2)).toBe('1300.00');
		expect(c.chargedKg.toString()).toBe('500');
		expect(c.ownBreak?.charge.toFixed(2)).toBe('1395.00');
	});
	it('below the break-even weight the own break stays: 419 kg × 3.10 = 1298.90', () => {
		expect(pick('419').charge.toFixed(2)).toBe('1298.90');
		expect(pick('419.5').fromKg.toString()).toBe('500');
	});
	it('90 kg is charged as 100 kg × 3.60 = 360.00', () => {
		expect(pick('90').charge.toFixed(2)).toBe('360.00');
	});
	it('10 kg × 5.00 = 50.00 is raised to the minimum charge 85.00', () => {
		const c = pick('10');
		expect(c.charge.toFixed(2)).toBe('85.00');
		expect(c.minimum).toBe(true);
	});
	it('a card without a break from 0 kg cannot price a small shipment', () => {
		expect(chooseAirBreak(dec('10'), [{ fromKg: '45', ratePerKg: '1' }], MIN)).toBeNull();
	});
});
