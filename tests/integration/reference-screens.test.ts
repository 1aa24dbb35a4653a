// Finance's rate cards, country rules (fees, de minimis) and settings: saved whole or not at all,
// optimistic versions, no overlapping dates per key, coordinators refused, read back by the
// engine's lookups in the engine's own shape.
import { afterAll, describe, expect, it } from 'vitest';
import { QueryTypes } from 'sequelize';
import { countryRuleSchema, customsFeeSchema, deMinimisSchema } from '$lib/schemas/country-rules';
import { settingsSchema } from '$lib/schemas/landed-cost-settings';
import { rateCardSchema, termsTemplate } from '$lib/schemas/rate-cards';
import { Place } from '$lib/server/db/models';
import {
	countryRules,
	findRateCard,
	landedCostSettings
} from '$lib/server/services/landed-cost/reference';
import {
	DE_MINIMIS,
	FEE,
	RULE,
	countryRuleFormValues,
	feeFormValues,
	getCountryRule,
	getFee,
	retireCountryRow,
	saveCountryRule,
	saveDeMinimis,
	saveFee
} from '$lib/server/services/reference-data/country-rules';
import {
	getRateCard,
	rateCardFormValues,
	retireRateCard,
	saveRateCard
} from '$lib/server/services/reference-data/rate-cards';
import {
	getSettings,
	listEmissionFactors,
	saveSettings,
	settingsFormValues
} from '$lib/server/services/reference-data/settings';
import { sessionUserFor } from './db';

const db = () => Place.sequelize!;
// A lane of two UN/LOCODE-shaped places no seed uses, unique per run (place part: letters only).
const letters = () =>
	Array.from({ length: 3 }, () => 'ABCDEFGHJKLMNPQRSTUVWXYZ'[Math.floor(Math.random() * 24)]).join(
		''
	);
const laneFrom = `NZ${letters()}`;
const laneTo = `IS${letters()}`;
// A country no seed has rules for; tests remove their own rows at the end.
const COUNTRY = 'IS';

afterAll(async () => {
	await db().query(`DELETE FROM rate_cards WHERE lane_from = :laneFrom`, {
		replacements: { laneFrom }
	});
	for (const table of ['country_rules', 'customs_fees', 'de_minimis_rules']) {
		await db().query(`DELETE FROM ${table} WHERE country = :c`, { replacements: { c: COUNTRY } });
	}
});

const airCard = (extra: Record<string, unknown> = {}) =>
	rateCardSchema.parse({
		laneFrom,
		laneTo,
		currency: 'USD',
		transitDays: 4,
		distanceKm: '16950',
		terms: {
			mode: 'air',
			minimumCharge: '95',
			breaks: ['0', '45', '100', '300', '500', '1000'].map((fromKg, i) => ({
				fromKg,
				ratePerKg: String(7 - i * 0.5)
			})),
			surcharges: [
				{ label: 'Fuel surcharge', basis: 'per_chargeable_kg', amount: '1.10', currency: 'USD' },
				{ label: 'Security surcharge', basis: 'per_chargeable_kg', amount: '0.15', currency: 'USD' }
			],
			originCharges: [],
			destinationCharges: [
				{ label: 'Handling', basis: 'per_kg', amount: '0.2', currency: 'EUR', minimum: '40' }
			]
		},
		source: 'Test quote AQ-1',
		validFrom: '2026-01-01',
		validTo: '2026-12-31',
		...extra
	});

describe('rate cards', () => {
	it('adds a card the engine lookup reads back, edits it with versions, retires it', async () => {
		const finance = await sessionUserFor('finance@solvrae.example');
		const added = await saveRateCard(finance, null, airCard(), null);
		expect(added.ok).toBe(true);
		const id = added.ok ? added.value.id : '';
		const place = (code: string) => ({ code, countryCode: code.slice(0, 2) });
		const found = await findRateCard('air', place(laneFrom), place(laneTo), '2026-06-01');
		expect(found).toMatchObject({
			id,
			mode: 'air',
			minimumCharge: '95',
			distanceKm: '16950',
			transitDays: 4,
			validTo: '2026-12-31'
		});
		expect(found?.mode === 'air' && found.breaks).toHaveLength(6);

		const stored = (await getRateCard(id))!;
		const edit = rateCardSchema.parse({ ...rateCardFormValues(stored), transitDays: 5 });
		expect((await saveRateCard(finance, id, edit, null)).ok).toBe(true);
		// The same page saving again still holds version 0: someone (here: itself) saved first.
		expect(await saveRateCard(finance, id, edit, null)).toMatchObject({ ok: false, status: 409 });
		expect(await getRateCard(id)).toMatchObject({ transitDays: 5, version: 1 });

		expect(await retireRateCard(finance, id, 1, '2025-12-31', null)).toMatchObject({
			status: 400,
			fieldErrors: { validTo: expect.stringContaining('2026-01-01') }
		});
		expect((await retireRateCard(finance, id, 1, '2026-09-30', null)).ok).toBe(true);
		expect(await getRateCard(id)).toMatchObject({ validTo: '2026-09-30', version: 2 });
		const [audit] = await db().query<{ action: string }>(
			`SELECT action FROM audit_events WHERE entity_id = :id ORDER BY occurred_at DESC LIMIT 1`,
			{ replacements: { id }, type: QueryTypes.SELECT }
		);
		expect(audit?.action).toBe('rate_card.retire');
	});

	it('refuses a card whose dates overlap the same lane and mode, and writes nothing', async () => {
		const finance = await sessionUserFor('finance@solvrae.example');
		const count = async () =>
			(
				await db().query<{ n: string }>(
					`SELECT count(*)::text AS n FROM rate_cards WHERE lane_from = :laneFrom`,
					{ replacements: { laneFrom }, type: QueryTypes.SELECT }
				)
			)[0]!.n;
		const before = await count();
		// The first test's card is valid 2026-01-01 – 2026-09-30.
		const clash = await saveRateCard(
			finance,
			null,
			airCard({ validFrom: '2026-09-30', validTo: '' }),
			null
		);
		expect(clash).toMatchObject({ ok: false, status: 400 });
		expect(!clash.ok && clash.fieldErrors.validFrom).toMatch(/2026-01-01 – 2026-09-30/);
		expect(await count()).toBe(before);
		// The day after is free; another mode on the same lane never competes.
		expect(
			(await saveRateCard(finance, null, airCard({ validFrom: '2026-10-01', validTo: '' }), null))
				.ok
		).toBe(true);
		const road = rateCardSchema.parse({
			...airCard(),
			terms: { ...termsTemplate('road'), rate: '0.45', minimumCharge: '80' }
		});
		expect((await saveRateCard(finance, null, road, null)).ok).toBe(true);
	});

	it('names the field at fault and refuses unknown container types', async () => {
		const bad = rateCardSchema.safeParse({
			...airCard(),
			laneFrom: 'XX1',
			terms: {
				...airCard().terms,
				breaks: [
					{ fromKg: '45', ratePerKg: '4' },
					{ fromKg: '45.0', ratePerKg: 'four' }
				]
			}
		});
		expect(bad.error?.issues.map((i) => i.path.join('.'))).toEqual(
			expect.arrayContaining([
				'laneFrom',
				'terms.breaks.1.ratePerKg',
				'terms.breaks.1.fromKg',
				'terms.breaks.0.fromKg'
			])
		);
		const finance = await sessionUserFor('finance@solvrae.example');
		const fcl = rateCardSchema.parse({
			...airCard({ validFrom: '2030-01-01', validTo: '' }),
			terms: {
				...termsTemplate('sea_fcl'),
				containerRates: [{ typeCode: 'C99ZZ', ratePerContainer: '1000' }],
				surcharges: [],
				originCharges: [],
				destinationCharges: []
			}
		});
		const result = await saveRateCard(finance, null, fcl, null);
		expect(result).toMatchObject({ ok: false, status: 400 });
		expect(!result.ok && Object.keys(result.fieldErrors)).toEqual([
			'terms.containerRates[0].typeCode'
		]);
	});

	it('refuses coordinators, who may only read', async () => {
		const coordinator = await sessionUserFor('coordinator@solvrae.example');
		const card = airCard({ validFrom: '2031-01-01', validTo: '' });
		expect(await saveRateCard(coordinator, null, card, null)).toMatchObject({ status: 403 });
	});
});

describe('country rules, fees and de minimis', () => {
	const rule = (extra: Record<string, unknown> = {}) =>
		countryRuleSchema.parse({
			country: COUNTRY,
			currency: 'ISK',
			valuationBasis: 'CIF',
			vat: {
				label: 'VAT',
				ratePercent: '24',
				reduced: [{ hsPrefix: '4901', ratePercent: '11' }],
				baseIncludes: ['duty', 'fees']
			},
			rounding: { vat: { multiple: '1', mode: 'half_up' } },
			source: 'Test rule',
			validFrom: '2026-01-01',
			...extra
		});

	it('adds the rules, a fee and a threshold; the engine lookup reads them in its shape', async () => {
		const finance = await sessionUserFor('finance@solvrae.example');
		const added = await saveCountryRule(finance, null, rule(), null);
		expect(added.ok).toBe(true);
		const fee = customsFeeSchema.parse({
			country: COUNTRY,
			code: 'is-test',
			label: 'Test processing fee',
			kind: 'ad_valorem',
			ratePercent: '0.25',
			minAmount: '500',
			maxAmount: '9000',
			modes: ['sea_fcl', 'sea_lcl'],
			source: 'Test fee notice',
			validFrom: '2026-01-01'
		});
		expect((await saveFee(finance, null, fee, null)).ok).toBe(true);
		const threshold = deMinimisSchema.parse({
			country: COUNTRY,
			dutyUpTo: '2000',
			currency: 'ISK',
			source: 'Test threshold',
			validFrom: '2026-01-01'
		});
		expect((await saveDeMinimis(finance, null, threshold, null)).ok).toBe(true);

		const forEngine = await countryRules(COUNTRY, '2026-06-01');
		expect(forEngine).toMatchObject({
			currency: 'ISK',
			valuationBasis: 'CIF',
			vat: { ratePercent: '24', reduced: [{ hsPrefix: '4901', ratePercent: '11' }] },
			rounding: { vat: { multiple: '1', mode: 'half_up' } },
			fees: [
				{
					code: 'IS-TEST',
					kind: 'ad_valorem',
					ratePercent: '0.25',
					amount: null,
					min: '500',
					max: '9000',
					modes: ['sea_fcl', 'sea_lcl']
				}
			],
			deMinimis: [{ dutyUpTo: '2000', vatUpTo: null, currency: 'ISK' }]
		});
	});

	it('edits with versions, refuses overlaps, and a fixed fee drops the ad valorem figures', async () => {
		const finance = await sessionUserFor('finance@solvrae.example');
		const [stored] = await db().query<{ id: string }>(
			`SELECT id FROM country_rules WHERE country = :c`,
			{ replacements: { c: COUNTRY }, type: QueryTypes.SELECT }
		);
		const id = stored!.id;
		const values = countryRuleFormValues((await getCountryRule(id))!);
		const edit = countryRuleSchema.parse({ ...values, valuationBasis: 'FOB' });
		expect((await saveCountryRule(finance, id, edit, null)).ok).toBe(true);
		expect(await saveCountryRule(finance, id, edit, null)).toMatchObject({ status: 409 });
		// A second open-ended rule for the country would hide the first: refused on validFrom.
		const second = await saveCountryRule(finance, null, rule({ validFrom: '2027-01-01' }), null);
		expect(second).toMatchObject({
			ok: false,
			status: 400,
			fieldErrors: { validFrom: expect.any(String) }
		});
		// End the first, then the next year's rule fits.
		expect((await retireCountryRow(RULE)(finance, id, 1, '2026-12-31', null)).ok).toBe(true);
		expect((await saveCountryRule(finance, null, rule({ validFrom: '2027-01-01' }), null)).ok).toBe(
			true
		);

		const [feeRow] = await db().query<{ id: string }>(
			`SELECT id FROM customs_fees WHERE country = :c`,
			{ replacements: { c: COUNTRY }, type: QueryTypes.SELECT }
		);
		const feeValues = feeFormValues((await getFee(feeRow!.id))!);
		const fixed = customsFeeSchema.parse({ ...feeValues, kind: 'fixed', amount: '1500' });
		expect((await saveFee(finance, feeRow!.id, fixed, null)).ok).toBe(true);
		expect(await getFee(feeRow!.id)).toMatchObject({
			kind: 'fixed',
			amount: '1500',
			ratePercent: null,
			minAmount: null,
			maxAmount: null,
			version: 1
		});
		// Retiring into no other row's dates; a stale version is refused.
		expect(await retireCountryRow(FEE)(finance, feeRow!.id, 0, '2026-12-31', null)).toMatchObject({
			status: 409
		});
		expect(
			await retireCountryRow(DE_MINIMIS)(finance, feeRow!.id, 0, '2026-12-31', null)
		).toMatchObject({
			status: 404
		});
	});

	it('names the fields at fault', () => {
		const paths = (
			schema: { safeParse: (v: unknown) => { error?: { issues: { path: PropertyKey[] }[] } } },
			v: unknown
		) => schema.safeParse(v).error?.issues.map((i) => i.path.join('.'));
		const fee = {
			country: COUNTRY,
			code: 'IS-X',
			label: 'X',
			source: 'x',
			validFrom: '2026-01-01'
		};
		expect(paths(customsFeeSchema, { ...fee, kind: 'ad_valorem', ratePercent: '' })).toEqual([
			'ratePercent'
		]);
		expect(paths(customsFeeSchema, { ...fee, kind: 'fixed' })).toEqual(['amount']);
		expect(paths(customsFeeSchema, { ...fee, kind: 'ad_valorem', ratePercent: '101' })).toEqual([
			'ratePercent'
		]);
		expect(
			paths(customsFeeSchema, {
				...fee,
				kind: 'ad_valorem',
				ratePercent: '1',
				minAmount: '10',
				maxAmount: '9.99'
			})
		).toEqual(['maxAmount']);
		expect(
			paths(customsFeeSchema, { ...fee, kind: 'fixed', amount: '1', modes: ['boat'] })
		).toEqual(['modes.0']);
		const dm = { country: COUNTRY, currency: 'ISK', source: 'x', validFrom: '2026-01-01' };
		expect(paths(deMinimisSchema, dm)).toEqual(['dutyUpTo']);
		expect(paths(deMinimisSchema, { ...dm, vatUpTo: '10', validTo: '2025-01-01' })).toEqual([
			'validTo'
		]);
		const vat = (reduced: unknown[], baseIncludes: string[]) => ({
			...rule(),
			vat: { label: 'VAT', ratePercent: '24', reduced, baseIncludes }
		});
		expect(paths(countryRuleSchema, vat([], ['duty', 'postage']))).toEqual(['vat.baseIncludes.1']);
		// The refinements run once the shape is right: a prefix listed twice.
		const twice = [
			{ hsPrefix: '49', ratePercent: '1' },
			{ hsPrefix: '49', ratePercent: '2' }
		];
		expect(paths(countryRuleSchema, vat(twice, ['duty']))).toEqual(['vat.reduced.1.hsPrefix']);
	});

	it('refuses coordinators', async () => {
		const coordinator = await sessionUserFor('coordinator@solvrae.example');
		expect(
			await saveCountryRule(coordinator, null, rule({ validFrom: '2040-01-01' }), null)
		).toMatchObject({ status: 403 });
	});
});

describe('landed-cost settings', () => {
	it('saves insurance, carrying rate, allocation and brokerage with versions', async () => {
		const finance = await sessionUserFor('finance@solvrae.example');
		const original = (await getSettings())!;
		const values = settingsFormValues(original);
		try {
			const input = settingsSchema.parse({
				...values,
				insuranceRatePercent: '0.35',
				allocation: 'weight',
				brokerage: [
					...values.brokerage,
					{
						country: 'IS',
						charges: [{ label: 'Entry', basis: 'per_shipment', amount: '15000', currency: 'ISK' }]
					}
				]
			});
			expect(await saveSettings(finance, input, null)).toEqual({
				ok: true,
				value: { version: original.version + 1 }
			});
			expect(await saveSettings(finance, input, null)).toMatchObject({ status: 409 });
			const read = await landedCostSettings();
			expect(read).toMatchObject({
				insurance: { ratePercent: '0.35' },
				allocation: 'weight',
				brokerage: { IS: [{ label: 'Entry', amount: '15000', currency: 'ISK' }] }
			});
			const coordinator = await sessionUserFor('coordinator@solvrae.example');
			expect(await saveSettings(coordinator, input, null)).toMatchObject({ status: 403 });
		} finally {
			// Put the demo's settings back for the other test files.
			const now = (await getSettings())!;
			await saveSettings(finance, settingsSchema.parse({ ...values, version: now.version }), null);
		}
	});

	it('names the fields at fault', () => {
		const values = {
			insuranceRatePercent: '0.3',
			insuranceUpliftPercent: '10',
			insuranceSource: 'x',
			carryingRatePercent: '8',
			allocation: 'value'
		};
		const paths = (v: Record<string, unknown>) =>
			settingsSchema.safeParse({ ...values, ...v }).error?.issues.map((i) => i.path.join('.'));
		expect(paths({ insuranceRatePercent: '120' })).toEqual(['insuranceRatePercent']);
		expect(paths({ insuranceRatePercent: '' })).toEqual(['insuranceRatePercent']);
		expect(paths({ carryingRatePercent: 'eight' })).toEqual(['carryingRatePercent']);
		expect(paths({ allocation: 'volume' })).toEqual(['allocation']);
		const entry = { label: 'Entry', basis: 'per_shipment', amount: '95', currency: 'EUR' };
		expect(
			paths({
				brokerage: [
					{ country: 'DE', charges: [entry] },
					{ country: 'DE', charges: [{ ...entry, currency: 'XYZ' }] }
				]
			})
		).toEqual(['brokerage.1.country', 'brokerage.1.charges.0.currency']);
		expect(paths({ brokerage: [{ country: 'DE', charges: [] }] })).toEqual(['brokerage.0.charges']);
	});

	it('lists the emission factors with their source', async () => {
		const factors = await listEmissionFactors();
		expect(factors.map((f) => f.mode)).toEqual(expect.arrayContaining(['air', 'sea_fcl', 'road']));
		expect(factors[0]!.source).toMatch(/ISO 14083/);
	});
});
