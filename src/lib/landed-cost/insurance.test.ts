import { describe, expect, it } from 'vitest';
import { dec } from './decimal';
import { insurancePremium } from './insurance';

// Formula: insured value = 110 % of CIF (UCP 600 Art. 28(f)(ii); Incoterms 2020 CIF/CIP A5),
// premium P = r × 1.1 × CIF, and since CIF includes P, CIF = CFR / (1 − 1.1 r) (the trade
// reference notes, /work/shared/notes/trade-reference.md). Numbers invented.
const terms = { ratePercent: '0.5', upliftPercent: '10', minimumPremium: null, source: 'test' };

describe('cargo insurance premium', () => {
	it('CFR 10,000.00 at 0.5 %: CIF = 10,000 / 0.9945 = 10,055.30, premium 55.30', () => {
		const p = insurancePremium(dec('10000.00'), terms, 'USD');
		expect(p.cif.toFixed(2)).toBe('10055.30');
		expect(p.insuredValue.toFixed(2)).toBe('11060.83');
		expect(p.premium.toFixed(2)).toBe('55.30');
		// The convention closes: CFR + premium = CIF (to the cent).
		expect(dec('10000.00').plus(p.premium).toFixed(2)).toBe(p.cif.toFixed(2));
	});
	it('a minimum premium applies when the computed one is lower', () => {
		const p = insurancePremium(dec('1000.00'), { ...terms, minimumPremium: '25.00' }, 'USD');
		expect(p.premium.toFixed(2)).toBe('25.00');
		expect(p.minimumApplied).toBe(true);
	});
	it('JPY premiums round to whole yen (ISO 4217 minor unit 0)', () => {
		expect(insurancePremium(dec('1000000'), terms, 'JPY').premium.toString()).toBe('5530');
	});
});
