// Finance's landed-cost reference data: exchange rates added one by one or imported all or none.
import { afterAll, describe, expect, it } from 'vitest';
import { QueryTypes } from 'sequelize';
import {
	exchangeRateImportSchema,
	exchangeRateSchema,
	tariffSchema
} from '$lib/schemas/reference-data';
import {
	getTariff,
	retireTariff,
	saveTariff,
	tariffFormValues
} from '$lib/server/services/reference-data/tariffs';
import { Place } from '$lib/server/db/models';
import {
	addExchangeRate,
	importExchangeRates,
	listExchangeRates
} from '$lib/server/services/reference-data/exchange-rates';
import { exchangeRates, tariffRows } from '$lib/server/services/landed-cost/reference';
import { sessionUserFor } from './db';

// A pair and a year no seed or other test uses, so parallel runs do not meet.
const QUOTES = ['NOK', 'SEK', 'DKK', 'PLN', 'CZK', 'HUF', 'ISK', 'RON'];
const quote = QUOTES[Math.floor(Math.random() * QUOTES.length)]!;
const year = 2100 + Math.floor(Math.random() * 800);
const day = (d: number) => `${year}-01-${String(d).padStart(2, '0')}`;
const db = () => Place.sequelize!;

afterAll(async () => {
	await db().query(
		`DELETE FROM exchange_rates WHERE base = 'CHF' AND quote = :quote AND valid_from BETWEEN :a AND :b`,
		{
			replacements: { quote, a: day(1), b: day(31) }
		}
	);
});

describe('exchange rates', () => {
	it('adds a rate and refuses a second one for the same pair and date on the date field', async () => {
		const finance = await sessionUserFor('finance@solvrae.example');
		const input = exchangeRateSchema.parse({
			base: 'CHF',
			quote,
			rate: '11.25',
			validFrom: day(1),
			source: 'Test rate'
		});
		expect((await addExchangeRate(finance, input, null)).ok).toBe(true);
		const again = await addExchangeRate(finance, input, null);
		expect(again).toMatchObject({ ok: false, status: 400 });
		expect(!again.ok && again.fieldErrors.validFrom).toMatch(/already has a rate/);
	});

	it('refuses coordinators, who may only read', async () => {
		const coordinator = await sessionUserFor('coordinator@solvrae.example');
		const input = exchangeRateSchema.parse({
			base: 'CHF',
			quote,
			rate: '1',
			validFrom: day(2),
			source: 'x'
		});
		expect(await addExchangeRate(coordinator, input, null)).toMatchObject({ status: 403 });
	});

	it('imports every rate of a file or none of them', async () => {
		const finance = await sessionUserFor('finance@solvrae.example');
		const rates = [3, 4, 5].map((d) => ({
			base: 'CHF',
			quote,
			rate: `11.${d}`,
			validFrom: day(d)
		}));
		// Day 1 exists already: nothing of this file is written.
		const clash = await importExchangeRates(
			finance,
			exchangeRateImportSchema.parse({
				source: 'Test table',
				rates: [...rates, { ...rates[0]!, validFrom: day(1) }]
			}),
			null
		);
		expect(clash).toMatchObject({ ok: false, status: 409 });
		expect(!clash.ok && clash.message).toContain(`CHF/${quote} ${day(1)}`);
		const pair = { base: 'CHF', quote };
		expect((await listExchangeRates(pair)).rows.map((r) => r.validFrom)).toEqual([day(1)]);

		const done = await importExchangeRates(
			finance,
			exchangeRateImportSchema.parse({ source: 'Test table', rates }),
			null
		);
		expect(done).toEqual({ ok: true, value: { count: 3 } });
		const listed = (await listExchangeRates(pair)).rows;
		expect(listed.map((r) => [r.validFrom, r.rate, r.validTo, r.source])).toEqual([
			[day(5), '11.5', null, 'Test table'],
			[day(4), '11.4', null, 'Test table'],
			[day(3), '11.3', null, 'Test table'],
			[day(1), '11.25', null, 'Test rate']
		]);
		// The landed-cost lookup takes the latest rate starting by the date: valid until the next.
		const onDay4 = (await exchangeRates(day(4))).find((r) => r.base === 'CHF' && r.quote === quote);
		expect(onDay4?.rate).toBe('11.4');
		const [audit] = await db().query<{ after: { count: number } }>(
			`SELECT after FROM audit_events WHERE action = 'exchange_rate.import' ORDER BY occurred_at DESC LIMIT 1`,
			{ type: QueryTypes.SELECT }
		);
		expect(audit?.after.count).toBe(3);
	});
});

describe('tariff rows', () => {
	const prefix = `9${Math.floor(Math.random() * 1e8)}`.slice(0, 9);
	afterAll(async () => {
		await db().query(`DELETE FROM tariff_rows WHERE hs_prefix = :prefix`, {
			replacements: { prefix }
		});
	});

	it('adds, edits with optimistic versions, and retires a row', async () => {
		const finance = await sessionUserFor('finance@solvrae.example');
		const input = tariffSchema.parse({
			destinationCountry: 'AU',
			hsPrefix: prefix,
			dutyKind: 'compound',
			ratePercent: '3',
			amount: '0.25',
			per: 'kg',
			currency: 'AUD',
			agreement: 'TEST-FTA',
			originCountries: 'my, sg',
			source: 'Test schedule',
			validFrom: '2026-01-01'
		});
		const added = await saveTariff(finance, null, input, null);
		expect(added.ok).toBe(true);
		const id = added.ok ? added.value.id : '';
		const stored = await getTariff(id);
		expect(stored).toMatchObject({
			originCountries: ['MY', 'SG'],
			duty: { kind: 'compound', ratePercent: '3', amount: '0.25', per: 'kg', currency: 'AUD' },
			version: 0
		});
		// The engine's lookup reads it back in its own shape.
		const forEngine = (await tariffRows('AU', '2026-06-01')).find((t) => t.id === id);
		expect(forEngine?.originCountries).toEqual(['MY', 'SG']);

		const edit = { ...tariffFormValues(stored!), ratePercent: '2.5' };
		expect((await saveTariff(finance, id, tariffSchema.parse(edit), null)).ok).toBe(true);
		// A second save from the same page (version 0) is stale.
		expect(await saveTariff(finance, id, tariffSchema.parse(edit), null)).toMatchObject({
			status: 409
		});
		expect(await retireTariff(finance, id, 1, '2025-12-31', null)).toMatchObject({
			status: 400,
			fieldErrors: { validTo: expect.stringContaining('2026-01-01') }
		});
		expect((await retireTariff(finance, id, 1, '2026-12-31', null)).ok).toBe(true);
		expect(await getTariff(id)).toMatchObject({ validTo: '2026-12-31', version: 2 });
	});
});
