import { describe, expect, it } from 'vitest';
import { Context } from './context';
import { indexTariff, pickTariff } from './tariff';
import { line, tariff } from './test-fixtures';

// Invented rows. HS structure (WCO): 8518 heading, 8518.22 multiple loudspeakers in one
// enclosure, 8518.30 headphones; national digits beyond six.
const rows = [
	tariff('85', '7'),
	tariff('8518', '5'),
	tariff('851822', '3.5'),
	tariff('8518', '0', { id: 'pref', agreement: 'MAFTA', originCountries: ['MY'] }),
	tariff('851830', '4', { id: 'old', validTo: '2025-12-31' })
];
const index = indexTariff(rows, 'AU', '2026-03-02');
const pick = (hsCode: string, claimed = false, origin = 'MY') => {
	const ctx = new Context('2026-03-02');
	return {
		choice: pickTariff(index, line({ hsCode, originCountry: origin }), 0, claimed, ctx),
		ctx
	};
};

describe('tariff lookup', () => {
	it('the longest matching prefix wins', () => {
		expect(pick('85182200').choice?.row.id).toBe('t-851822-3.5');
		expect(pick('85183000').choice?.row.id).toBe('t-8518-5');
		expect(pick('85171300').choice?.row.id).toBe('t-85-7');
	});
	it('the preferential row applies only when a proof of origin is claimed for its origins', () => {
		expect(pick('85182200', true).choice).toMatchObject({
			preferential: true,
			row: { id: 'pref' }
		});
		expect(pick('85182200', true, 'CN').choice?.preferential).toBe(false);
		expect(pick('85182200', false).choice?.preferential).toBe(false);
	});
	it('no row at all, or only an expired one, is reported with the line path', () => {
		const { choice, ctx } = pick('94054000');
		expect(choice).toBeNull();
		expect(ctx.missing[0]?.path).toBe('lines[0].hsCode');
		const only = indexTariff([tariff('8518', '4', { validTo: '2025-12-31' })], 'AU', '2026-03-02');
		const c2 = new Context('2026-03-02');
		pickTariff(only, line({ hsCode: '85183000' }), 0, false, c2);
		expect(c2.missing[0]?.message).toContain('expired on 2025-12-31');
	});
});
