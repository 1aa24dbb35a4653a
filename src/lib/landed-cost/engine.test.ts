import { describe, expect, it } from 'vitest';
import { landedCost } from './engine';
import { baseInput, country, courierCard, line, rate, tariff } from './test-fixtures';
import type { Fee, LandedCostOk, LandedCostResult } from './types';

function ok(result: LandedCostResult): LandedCostOk {
	if (!result.ok) throw new Error(JSON.stringify(result.missing));
	return result;
}

describe('worked examples from official sources', () => {
	it('Australian GST on imports: A$1,400 + A$130 + A$70 duty = A$1,600, GST A$160', () => {
		// Source: Australian customs (ABF) worked example of GST on imported goods, as quoted in
		// /work/shared/notes/trade-reference.md: US$1,274 at 0.91 = A$1,400; postage and insurance
		// A$130; duty 5 % = A$70; value of the taxable importation A$1,600; GST A$160; duty and
		// GST A$230. GST base per A New Tax System (Goods and Services Tax) Act 1999, s.13-20.
		const r = ok(
			landedCost(
				baseInput({
					goodsCurrency: 'USD',
					lines: [line({ unitPrice: '1274.00' })],
					measures: {
						grossKg: '0.4',
						volumeM3: '0.001',
						chargeableKg: '0.5',
						pallets: 0,
						containers: []
					},
					// Postage and insurance A$130 as one courier charge; the premium rate is 0.
					rateCard: courierCard({ firstHalfKg: '130.00' }),
					exchangeRates: [rate('AUD', 'USD', '0.91')]
				})
			)
		);
		expect(r.customsValue.assessed).toEqual({ amount: '1400.00', currency: 'AUD' });
		expect(r.components.duty.amount).toBe('70.00');
		expect(r.components.vat.amount).toBe('160.00');
		expect(r.trail.find((s) => s.key === 'vat.10')?.formula).toContain('1600');
		expect(Number(r.components.duty.amount) + Number(r.components.vat.amount)).toBe(230);
	});

	it('Irish Revenue example: duty €15, VAT 23 % on €1,115 = €256.45', () => {
		// Source: Revenue (Ireland), "How to calculate what you owe" (travelling from outside the
		// EU), revenue.ie: camera €500 at 0 % duty, shirts €600 at the 2.5 % standard rate = €15;
		// VAT on €500 + €600 + €15 = €1,115 at 23 % = €256.45. (The traveller's allowance item of
		// that example is left out.) VAT base per Council Directive 2006/112/EC, Art. 85–86.
		const ie = country({
			id: 'cr-ie',
			country: 'IE',
			currency: 'EUR',
			valuationBasis: 'CIF',
			vat: { label: 'VAT', ratePercent: '23', reduced: [], baseIncludes: ['duty'] }
		});
		const r = ok(
			landedCost(
				baseInput({
					destinationCountry: 'IE',
					reportCurrency: 'EUR',
					goodsCurrency: 'EUR',
					country: ie,
					rateCard: courierCard({ currency: 'EUR', laneTo: 'IE' }),
					lines: [
						line({ ref: 'camera', hsCode: '85258900', unitPrice: '500.00' }),
						line({ ref: 'shirts', hsCode: '62052000', quantity: 10, unitPrice: '60.00' })
					],
					tariffRows: [
						tariff('8525', '0', { destinationCountry: 'IE' }),
						tariff('6205', '2.5', { destinationCountry: 'IE' })
					]
				})
			)
		);
		expect(r.components.duty.amount).toBe('15.00');
		expect(r.components.vat.amount).toBe('256.45');
		expect(r.perLine.map((l) => l.shares.duty)).toEqual(['0.00', '15.00']);
	});
});

describe('US customs fees', () => {
	// Source: 19 CFR 24.23 (MPF 0.3464 % ad valorem); FY2026 minimum $33.58 and maximum $651.50
	// from 1 October 2025 (CBP Dec. 25-10, 90 FR 34665); FY2025 $32.71 / $634.62 (Federal
	// Register 2024-15990); HMF 0.125 % on sea cargo, 19 CFR 24.24.
	const fee = (
		over: Pick<Fee, 'id' | 'validFrom' | 'validTo' | 'min' | 'max'> & Partial<Fee>
	): Fee => ({
		source: '19 CFR 24.23; CBP Dec. 25-10',
		code: 'US-MPF',
		label: 'Merchandise processing fee',
		kind: 'ad_valorem' as const,
		ratePercent: '0.3464',
		amount: null,
		base: 'customs_value' as const,
		modes: null,
		...over
	});
	const fees = [
		fee({
			id: 'mpf-fy25',
			validFrom: '2024-10-01',
			validTo: '2025-09-30',
			min: '32.71',
			max: '634.62'
		}),
		fee({
			id: 'mpf-fy26',
			validFrom: '2025-10-01',
			validTo: '2026-09-30',
			min: '33.58',
			max: '651.50'
		}),
		fee({
			id: 'hmf',
			code: 'US-HMF',
			label: 'Harbor maintenance fee',
			ratePercent: '0.125',
			validFrom: '1987-04-01',
			validTo: null,
			min: null,
			max: null,
			modes: ['sea_fcl', 'sea_lcl'],
			source: '19 CFR 24.24'
		})
	];
	const us = country({
		id: 'cr-us',
		country: 'US',
		currency: 'USD',
		valuationBasis: 'FOB',
		vat: { label: 'none', ratePercent: '0', reduced: [], baseIncludes: [] },
		fees
	});
	const usInput = (value: string, date: string, mode: 'courier' | 'sea_lcl' = 'courier') =>
		baseInput({
			date,
			mode,
			destinationCountry: 'US',
			reportCurrency: 'USD',
			goodsCurrency: 'USD',
			country: us,
			lines: [line({ unitPrice: value })],
			rateCard:
				mode === 'courier'
					? courierCard({ currency: 'USD', laneTo: 'US' })
					: {
							...courierCard({ currency: 'USD', laneTo: 'US' }),
							mode: 'sea_lcl',
							ratePerWm: '0',
							minimumWm: '1',
							minimumCharge: '0'
						},
			tariffRows: [tariff('8518', '0', { destinationCountry: 'US' })]
		});
	const feeStep = (r: LandedCostOk, code: string) => r.trail.find((s) => s.key === `fee.${code}`);

	it('FY2026: $100,000 → MPF $346.40', () => {
		const r = ok(landedCost(usInput('100000.00', '2026-03-02')));
		expect(feeStep(r, 'US-MPF')?.amount).toBe('346.40');
		expect(feeStep(r, 'US-MPF')?.rowId).toBe('mpf-fy26');
	});
	it('FY2026 minimum $33.58 and maximum $651.50', () => {
		expect(feeStep(ok(landedCost(usInput('5000.00', '2026-03-02'))), 'US-MPF')?.amount).toBe(
			'33.58'
		);
		expect(feeStep(ok(landedCost(usInput('500000.00', '2026-03-02'))), 'US-MPF')?.amount).toBe(
			'651.50'
		);
	});
	it('FY2025 bounds apply to a date before 1 October 2025', () => {
		expect(feeStep(ok(landedCost(usInput('5000.00', '2025-09-30'))), 'US-MPF')?.amount).toBe(
			'32.71'
		);
	});
	it('HMF 0.125 % on sea cargo only', () => {
		const sea = ok(landedCost(usInput('100000.00', '2026-03-02', 'sea_lcl')));
		expect(feeStep(sea, 'US-HMF')?.amount).toBe('125.00');
		expect(sea.components.fees.amount).toBe('471.40');
		const air = ok(landedCost(usInput('100000.00', '2026-03-02')));
		expect(feeStep(air, 'US-HMF')).toBeUndefined();
	});
	it('a date past the last MPF version says the fee data has expired', () => {
		const r = landedCost(usInput('1000.00', '2026-10-01'));
		expect(r.ok).toBe(false);
		if (!r.ok) expect(r.missing[0]?.message).toMatch(/US-MPF .*expired on 2026-09-30/);
	});
});

describe('what is missing is said, not computed with a zero', () => {
	it('no rate card for the lane', () => {
		const r = landedCost(baseInput({ rateCard: null }));
		expect(r).toEqual({
			ok: false,
			missing: [{ path: 'rateCard', message: 'no rate card for the lane MY → AU and mode courier' }]
		});
	});
	it('no tariff row for an HS code', () => {
		const r = landedCost(baseInput({ lines: [line({ hsCode: '94054000' })] }));
		expect(r.ok).toBe(false);
		if (!r.ok)
			expect(r.missing).toEqual([
				{
					path: 'lines[0].hsCode',
					message: "no tariff row for HS 94054000 in the destination's tariff"
				}
			]);
	});
	it('no exchange rate for the date, and an expired one', () => {
		const none = landedCost(baseInput({ goodsCurrency: 'USD' }));
		expect(none.ok).toBe(false);
		if (!none.ok)
			expect(none.missing[0]?.message).toBe('no exchange rate USD → AUD for 2026-03-02');
		const old = landedCost(
			baseInput({
				goodsCurrency: 'USD',
				exchangeRates: [rate('USD', 'AUD', '1.5', { validTo: '2026-02-28' })]
			})
		);
		if (!old.ok) expect(old.missing[0]?.message).toContain('expired on 2026-02-28');
		expect(old.ok).toBe(false);
	});
	it('an expired rate card and malformed amounts', () => {
		const r = landedCost(
			baseInput({
				rateCard: courierCard({ validTo: '2025-12-31', firstHalfKg: '12,50' }),
				lines: [line({ quantity: 0 })]
			})
		);
		expect(r.ok).toBe(false);
		if (!r.ok) {
			expect(r.missing.map((m) => m.path)).toEqual([
				'lines[0].quantity',
				'rateCard',
				'rateCard.firstHalfKg'
			]);
		}
	});
});

describe('Incoterms 2020: who bears what', () => {
	it('DDP puts duty and VAT on the seller; FOB puts freight and duty on the buyer', () => {
		const ddp = ok(landedCost(baseInput({ incoterm: 'DDP' })));
		expect(ddp.components.duty.bearer).toBe('seller');
		expect(ddp.components.vat.bearer).toBe('seller');
		expect(ddp.components.freight.bearer).toBe('seller');
		const fob = ok(landedCost(baseInput({ incoterm: 'FOB' })));
		expect(fob.components.freight.bearer).toBe('buyer');
		expect(fob.components.duty.bearer).toBe('buyer');
		expect(fob.cautions.some((c) => c.includes('sea and inland waterway'))).toBe(true);
		// Seller's costs + buyer's = total, under any rule.
		for (const r of [ddp, fob]) {
			expect(Number(r.sellerCosts.amount) + Number(r.landedCostToBuyer.amount)).toBeCloseTo(
				Number(r.total.amount),
				6
			);
		}
	});
});

describe('trail, dates and extras', () => {
	it('every conversion states its rate and date, and the rows used are listed', () => {
		const r = ok(
			landedCost(
				baseInput({
					goodsCurrency: 'USD',
					exchangeRates: [rate('AUD', 'USD', '0.65', { validFrom: '2026-03-01' })]
				})
			)
		);
		const fx = r.trail.find((s) => s.key === 'fx.goods.AUD');
		expect(fx?.formula).toContain('1 AUD = 0.65 USD, rate of 2026-03-01 (inverted)');
		expect(fx?.amount).toBe('153.85'); // 100 / 0.65 = 153.846… half up
		expect(r.asOf.data.map((d) => d.kind)).toEqual(
			expect.arrayContaining(['rate_card', 'country', 'exchange_rate', 'tariff'])
		);
		expect(r.cautions.join(' ')).toMatch(/licensed customs broker/);
	});
	it('carrying cost = value × rate × days / 365; emissions = t × km × g/t·km / 1000', () => {
		// Formulas: carrying cost common practice; emissions per ISO 14083:2023 (tonne-km × factor).
		// Numbers invented: 36500.00 × 10 % × 4 / 365 = 40.00; 1.2 t × 1000 km × 500 g = 600 kg.
		const r = ok(
			landedCost(
				baseInput({
					lines: [line({ unitPrice: '36500.00' })],
					carryingRatePercent: '10',
					measures: {
						grossKg: '1200',
						volumeM3: '1',
						chargeableKg: '1200',
						pallets: 0,
						containers: []
					},
					distanceKm: '1000',
					emissionFactor: {
						id: 'ef',
						source: 'invented',
						validFrom: '2025-01-01',
						validTo: null,
						gCo2ePerTonneKm: '500'
					}
				})
			)
		);
		expect(r.carryingCost.amount).toBe('40.00');
		expect(r.emissionsKgCo2e).toBe('600.000');
	});
});
