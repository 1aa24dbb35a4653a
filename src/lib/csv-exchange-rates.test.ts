import { describe, expect, it } from 'vitest';
import { parseExchangeRatesCsv } from './csv-exchange-rates';

describe('parseExchangeRatesCsv, long layout', () => {
	it('reads date,base,quote,rate one rate per row', () => {
		const { layout, rows, fileError } = parseExchangeRatesCsv(
			'date,base,quote,rate\n2026-12-01,usd,EUR,0.9210\n2026-12-02,USD,EUR,0.9188\n'
		);
		expect(fileError).toBeNull();
		expect(layout).toBe('long');
		expect(rows.map((r) => r.rates)).toEqual([
			[{ base: 'USD', quote: 'EUR', rate: '0.9210', validFrom: '2026-12-01' }],
			[{ base: 'USD', quote: 'EUR', rate: '0.9188', validFrom: '2026-12-02' }]
		]);
	});

	it('gives each bad row its own errors, with the row number a spreadsheet shows', () => {
		const { rows } = parseExchangeRatesCsv(
			'date,base,quote,rate\n2026-02-30,USD,EUR,0.92\n2026-12-01,USD,USD,1\n2026-12-01,USD,XYZ,-1\n'
		);
		expect(rows.map((r) => r.row)).toEqual([2, 3, 4]);
		expect(rows[0]!.errors.join(' ')).toMatch(/date: .*YYYY-MM-DD/);
		expect(rows[1]!.errors.join(' ')).toMatch(/must differ from the base/);
		expect(rows[2]!.errors.join(' ')).toMatch(/ISO 4217/);
		expect(rows[2]!.errors.join(' ')).toMatch(/Rate/);
		expect(rows.every((r) => r.rates.length === 0)).toBe(true);
	});

	it('refuses a pair and date given twice', () => {
		const { rows } = parseExchangeRatesCsv(
			'date,base,quote,rate\n2026-12-01,USD,EUR,0.92\n2026-12-01,USD,EUR,0.93\n'
		);
		expect(rows[0]!.errors).toEqual([]);
		expect(rows[1]!.errors).toEqual(['USD/EUR 2026-12-01 appears twice in the file.']);
	});

	it('explains the header when the columns are not recognised', () => {
		expect(parseExchangeRatesCsv('when,what\n1,2').fileError).toMatch(/date,base,quote,rate/);
		expect(parseExchangeRatesCsv('date,base,rate\n2026-12-01,USD,1').fileError).toMatch(
			/date,base,quote,rate/
		);
	});
});

describe('parseExchangeRatesCsv, wide layout', () => {
	// The layout of the ECB's euro foreign exchange reference rates history file (eurofxref-hist.csv:
	// "Date" then one column per currency, "N/A" where a currency has no rate, a trailing comma);
	// European Central Bank, Statistical Data Warehouse download, from memory. Figures invented.
	const ecbLike =
		'Date,USD,JPY,CYP,\n2026-12-02,1.0861,163.12,N/A,\n2026-12-01,1.0850,162.90,N/A,\n';

	it('reads one row per date and one column per currency against the chosen base', () => {
		const { layout, rows, fileError } = parseExchangeRatesCsv(ecbLike, 'eur');
		expect(fileError).toBeNull();
		expect(layout).toBe('wide');
		expect(rows[0]!.errors).toEqual([]);
		expect(rows[0]!.rates).toEqual([
			{ base: 'EUR', quote: 'USD', rate: '1.0861', validFrom: '2026-12-02' },
			{ base: 'EUR', quote: 'JPY', rate: '163.12', validFrom: '2026-12-02' }
		]);
		expect(rows.flatMap((r) => r.rates)).toHaveLength(4);
	});

	it('asks for the base before reading the rates', () => {
		const { layout, rows, fileError } = parseExchangeRatesCsv(ecbLike);
		expect(layout).toBe('wide');
		expect(rows).toEqual([]);
		expect(fileError).toMatch(/choose the base currency/);
	});

	it('flags a column that is the base itself and a row without rates', () => {
		const { rows } = parseExchangeRatesCsv(
			'date,usd,eur\n2026-12-01,1,0.92\n2026-12-02,,\n',
			'USD'
		);
		expect(rows[0]!.errors).toEqual([
			'USD/USD quote: The quote currency must differ from the base.'
		]);
		expect(rows[1]!.errors).toEqual(['No rate in this row.']);
	});
});
