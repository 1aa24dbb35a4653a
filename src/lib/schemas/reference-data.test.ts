import { describe, expect, it } from 'vitest';
import { dutyRateSchema } from './landed-cost';
import { dutyFields, tariffDuty, tariffSchema } from './reference-data';

const row = {
	destinationCountry: 'AU',
	hsPrefix: '8518',
	dutyKind: 'ad_valorem',
	ratePercent: '5',
	source: 'Test schedule',
	validFrom: '2026-01-01'
};

describe('tariffSchema', () => {
	it('turns each kind of duty into the jsonb the engine reads, and back', () => {
		for (const extra of [
			{ dutyKind: 'ad_valorem', ratePercent: '5' },
			{ dutyKind: 'specific', ratePercent: '', amount: '0.5', per: 'kg', currency: 'USD' },
			{ dutyKind: 'compound', ratePercent: '3', amount: '1', per: 'unit', currency: 'EUR' }
		]) {
			const input = tariffSchema.parse({ ...row, ...extra });
			const duty = dutyRateSchema.parse(tariffDuty(input));
			expect(dutyFields(duty)).toMatchObject(extra);
		}
	});

	it('takes HS prefixes of 2 to 10 digits', () => {
		// HS: 2-digit chapters, 4-digit headings, 6-digit subheadings (WCO, Harmonized System
		// Nomenclature 2022 edition); national tariff lines extend to 8 or 10 digits (common practice).
		for (const ok of ['85', '8518', '851830', '85183000', '8518300010']) {
			expect(tariffSchema.safeParse({ ...row, hsPrefix: ok }).success).toBe(true);
		}
		for (const bad of ['8', '8518.30', '85183000101']) {
			expect(tariffSchema.safeParse({ ...row, hsPrefix: bad }).error?.issues[0]?.path).toEqual([
				'hsPrefix'
			]);
		}
	});

	it('names the field at fault', () => {
		const paths = (extra: Record<string, string>) =>
			tariffSchema.safeParse({ ...row, ...extra }).error?.issues.map((i) => i.path[0]);
		expect(paths({ dutyKind: 'specific', amount: 'x' })).toEqual(['amount', 'currency']);
		expect(paths({ agreement: 'MAFTA' })).toEqual(['originCountries']);
		expect(paths({ originCountries: 'MY' })).toEqual(['agreement']);
		expect(paths({ agreement: 'MAFTA', originCountries: 'MY, XX' })).toEqual(['originCountries']);
		expect(paths({ validTo: '2025-12-31' })).toEqual(['validTo']);
		expect(
			tariffSchema.safeParse({ ...row, agreement: 'MAFTA', originCountries: 'my;sg' }).success
		).toBe(true);
	});
});
