import Decimal from 'decimal.js';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
	CHARGEABLE_RULES,
	CHARGE_MODES,
	chargeableRule,
	chargeableWeight,
	chargeableWeights,
	mmToNearestCm,
	type ChargeMode,
	type ChargeablePiece,
	type ChargeableWeight
} from './chargeable';

function mode(results: ChargeableWeight[], wanted: ChargeMode): ChargeableWeight {
	const found = results.find((r) => r.mode === wanted);
	if (found === undefined) throw new Error(`no result for ${wanted}`);
	return found;
}

function air(pieces: ChargeablePiece[]): ChargeableWeight {
	return chargeableWeight(pieces, chargeableRule('air'));
}

const piece = (
	lengthMm: number,
	widthMm: number,
	heightMm: number,
	grossKg: string,
	count = 1
): ChargeablePiece => ({ lengthMm, widthMm, heightMm, grossKg, count });

describe('rules as data', () => {
	it('has one rule per mode, each with a source note', () => {
		expect(CHARGEABLE_RULES.map((r) => r.mode)).toEqual([...CHARGE_MODES]);
		for (const rule of CHARGEABLE_RULES) expect(rule.source.length, rule.mode).toBeGreaterThan(20);
	});

	it('uses the stated factors', () => {
		// IATA volumetric rule 6000 cm³/kg (IATA TACT Rules, from memory); courier 5000 (common
		// practice); road 333 kg/m³ (common practice); W/M 1 m³ = 1000 kg, minimum 1 (common practice).
		expect(chargeableRule('air')).toMatchObject({ cm3PerKg: '6000', roundUpToKg: '0.5' });
		expect(chargeableRule('courier')).toMatchObject({ cm3PerKg: '5000', roundUpToKg: '0.5' });
		expect(chargeableRule('road')).toMatchObject({ kgPerM3: '333' });
		expect(chargeableRule('sea_lcl')).toMatchObject({
			m3PerRevenueTonne: '1',
			kgPerRevenueTonne: '1000',
			minimumRevenueTonnes: '1'
		});
		expect(chargeableRule('sea_fcl').kind).toBe('per_container');
	});
});

describe('air: the IATA volumetric rule', () => {
	it('computes the worked example: 150.2 × 125.5 × 100.6 cm, 300 kg → 318.5 kg', () => {
		// IATA volumetric rule as taught in IATA cargo training and widely reproduced (TACT Rules,
		// from memory): 150 × 126 × 101 = 1,908,900 cm³ ÷ 6000 = 318.15 kg → 318.5 kg.
		const result = air([piece(1502, 1255, 1006, '300')]);
		expect(result.basis).toBe('volume');
		expect(result.grossKg).toBe('300.000');
		expect(result.volumeWeightKg).toBe('318.150');
		expect(result.chargeableKg).toBe('318.500');
		expect(result.steps.join('\n')).toContain('150 × 126 × 101 cm = 1,908,900 cm³');
		expect(result.steps.join('\n')).toContain('318.15 kg');
		expect(result.steps.at(-1)).toBe('Rounded up to the next 0.5 kg: 318.5 kg chargeable');
	});

	it('matches a forwarder’s published example: 30 × 45 × 65 cm, 14 kg → 15 kg', () => {
		// Pengelly's (NZ freight forwarder), air freight volumetric fact sheet (undated, checked):
		// 87,750 cm³ ÷ 6000 = 14.625 kg volumetric, charged as 15 kg.
		const result = air([piece(300, 450, 650, '14')]);
		expect(result.volumeWeightKg).toBe('14.625');
		expect(result.chargeableKg).toBe('15.000');
		expect(result.basis).toBe('volume');
	});

	it('rounds each dimension to the nearest cm, 0.5 cm up', () => {
		// IATA volumetric rule (from memory): fractions of 0.5 cm and above up, below down.
		expect(mmToNearestCm(1255)).toBe(126);
		expect(mmToNearestCm(1254)).toBe(125);
		expect(mmToNearestCm(1005)).toBe(101);
		expect(mmToNearestCm(1004)).toBe(100);
		expect(mmToNearestCm(5)).toBe(1);
		expect(mmToNearestCm(4)).toBe(0);
		// 100.5 cm cube → 101³ = 1,030,301 cm³ ÷ 6000 = 171.716… kg → 172 kg.
		expect(air([piece(1005, 1005, 1005, '1')]).chargeableKg).toBe('172.000');
		// 100.4 cm cube → 100³ = 1,000,000 cm³ ÷ 6000 = 166.666… kg → 167 kg.
		const down = air([piece(1004, 1004, 1004, '1')]);
		expect(down.volumeWeightKg).toBe('166.667');
		expect(down.chargeableKg).toBe('167.000');
	});

	it('rounds the chargeable weight up to the next 0.5 kg', () => {
		// 60 × 50 × 40 cm = 120,000 cm³ ÷ 6000 = 20 kg volume weight exactly.
		const cases: [string, string, string][] = [
			['19.999', '20.000', 'volume'],
			['20', '20.000', 'gross'],
			['20.001', '20.500', 'gross'],
			['20.5', '20.500', 'gross'],
			['20.501', '21.000', 'gross']
		];
		for (const [gross, chargeable, basis] of cases) {
			const result = air([piece(600, 500, 400, gross)]);
			expect(result.chargeableKg, gross).toBe(chargeable);
			expect(result.basis, gross).toBe(basis);
		}
	});

	it('sums piece volumes before dividing and rounds once', () => {
		// 3 × (10 × 10 × 10 cm) = 3000 cm³ ÷ 6000 = 0.5 kg; gross 3 × 0.1 = 0.3 kg → 0.5 kg.
		const result = air([piece(100, 100, 100, '0.1', 3)]);
		expect(result.volumeWeightKg).toBe('0.500');
		expect(result.chargeableKg).toBe('0.500');
		expect(result.steps[0]).toContain('1,000 cm³ each, 3,000 cm³ in all');
	});

	it('uses 5000 cm³/kg for courier', () => {
		// common practice: 1,908,900 ÷ 5000 = 381.78 kg → 382 kg.
		const result = chargeableWeight([piece(1502, 1255, 1006, '300')], chargeableRule('courier'));
		expect(result.volumeWeightKg).toBe('381.780');
		expect(result.chargeableKg).toBe('382.000');
	});
});

describe('sea LCL: weight or measure (common practice)', () => {
	const lcl = (pieces: ChargeablePiece[]) => chargeableWeight(pieces, chargeableRule('sea_lcl'));

	it('charges at least 1 revenue tonne', () => {
		// 0.5 × 0.4 × 0.3 m = 0.06 m³, 50 kg = 0.05 t → minimum 1.
		const result = lcl([piece(500, 400, 300, '50')]);
		expect(result.basis).toBe('revenue_tonnes');
		expect(result.revenueTonnes).toBe('1.000000');
		expect(result.chargeableKg).toBeNull();
		expect(result.volumeM3).toBe('0.060000');
	});

	it('charges the weight when tonnes exceed cubic metres', () => {
		// 2 × 1 m³ = 2 m³; 2 × 1750 kg = 3.5 t → 3.5.
		expect(lcl([piece(1000, 1000, 1000, '1750', 2)]).revenueTonnes).toBe('3.500000');
	});

	it('charges the measure when cubic metres exceed tonnes', () => {
		// 2 × 1.25 m³ = 2.5 m³; 800 kg = 0.8 t → 2.5.
		expect(lcl([piece(1000, 1000, 1250, '400', 2)]).revenueTonnes).toBe('2.500000');
	});

	it('uses the exact volume (no centimetre rounding)', () => {
		// 1.502 × 1.255 × 1.006 = 1.89632006 m³ → 1.896321 rounded up to 6 decimals.
		const result = lcl([piece(1502, 1255, 1006, '300')]);
		expect(result.volumeM3).toBe('1.896320');
		expect(result.revenueTonnes).toBe('1.896321');
	});
});

describe('road: 1 m³ = 333 kg (common practice)', () => {
	const road = (pieces: ChargeablePiece[]) => chargeableWeight(pieces, chargeableRule('road'));

	it('charges 333 kg for a light cubic metre', () => {
		const result = road([piece(1000, 1000, 1000, '200')]);
		expect(result.volumeWeightKg).toBe('333.000');
		expect(result.chargeableKg).toBe('333.000');
		expect(result.basis).toBe('volume');
	});

	it('charges the gross when heavier', () => {
		const result = road([piece(1000, 1000, 1000, '400')]);
		expect(result.chargeableKg).toBe('400.000');
		expect(result.basis).toBe('gross');
	});

	it('scales with volume: 2.5 m³ → 832.5 kg', () => {
		expect(road([piece(1000, 1000, 2500, '100')]).chargeableKg).toBe('832.500');
	});

	it('rounds up to the gram', () => {
		// 1.89632006 m³ × 333 = 631.47457998 kg → 631.475 kg.
		expect(road([piece(1502, 1255, 1006, '300')]).chargeableKg).toBe('631.475');
	});
});

describe('sea FCL', () => {
	it('says it is charged per container and gives no chargeable weight', () => {
		const result = chargeableWeight([piece(1000, 1000, 1000, '400')], chargeableRule('sea_fcl'));
		expect(result.basis).toBe('per_container');
		expect(result.chargeableKg).toBeNull();
		expect(result.volumeWeightKg).toBeNull();
		expect(result.revenueTonnes).toBeNull();
		expect(result.steps[0]).toMatch(/per container/);
		expect(result.grossKg).toBe('400.000');
	});
});

describe('input checks', () => {
	it('throws on malformed pieces', () => {
		expect(() => chargeableWeights([piece(0, 1, 1, '1')])).toThrow(RangeError);
		expect(() => chargeableWeights([piece(1, 1, 1, '1', 0)])).toThrow(RangeError);
		expect(() => chargeableWeights([piece(1, 1, 1, '-1')])).toThrow(RangeError);
		expect(() => chargeableWeights([piece(1.5, 1, 1, '1')])).toThrow(RangeError);
	});

	it('handles no pieces', () => {
		const results = chargeableWeights([]);
		expect(mode(results, 'air').chargeableKg).toBe('0.000');
		expect(mode(results, 'sea_lcl').revenueTonnes).toBe('1.000000');
	});
});

const pieceArb = fc.record({
	lengthMm: fc.integer({ min: 1, max: 3000 }),
	widthMm: fc.integer({ min: 1, max: 2500 }),
	heightMm: fc.integer({ min: 1, max: 2500 }),
	grossKg: fc
		.tuple(fc.integer({ min: 0, max: 2000 }), fc.integer({ min: 0, max: 999 }))
		.map(([kg, g]) => `${kg}.${String(g).padStart(3, '0')}`),
	count: fc.integer({ min: 1, max: 50 })
});

describe('properties', () => {
	it('chargeable ≥ gross and ≥ volume weight; air/courier within 0.5 kg, on a 0.5 kg step', () => {
		fc.assert(
			fc.property(fc.array(pieceArb, { minLength: 1, maxLength: 6 }), (pieces) => {
				for (const r of chargeableWeights(pieces)) {
					if (r.mode === 'sea_fcl') continue;
					if (r.mode === 'sea_lcl') {
						const revenue = new Decimal(r.revenueTonnes ?? 'NaN');
						expect(revenue.gte(1)).toBe(true);
						expect(revenue.gte(new Decimal(r.grossKg).div(1000))).toBe(true);
						continue;
					}
					const chargeable = new Decimal(r.chargeableKg ?? 'NaN');
					const greater = Decimal.max(r.grossKg, r.volumeWeightKg ?? 'NaN');
					expect(chargeable.gte(r.grossKg)).toBe(true);
					expect(chargeable.gte(greater.minus('0.0005'))).toBe(true);
					if (r.mode === 'air' || r.mode === 'courier') {
						expect(chargeable.mod('0.5').isZero()).toBe(true);
						expect(chargeable.minus(greater).lt('0.5')).toBe(true);
					}
				}
			})
		);
	});

	it('adding a piece never lowers any chargeable figure', () => {
		fc.assert(
			fc.property(fc.array(pieceArb, { maxLength: 5 }), pieceArb, (pieces, extra) => {
				const before = chargeableWeights(pieces);
				const after = chargeableWeights([...pieces, extra]);
				before.forEach((b, i) => {
					const a = after[i];
					if (a === undefined) throw new Error('missing mode');
					const figure = (r: ChargeableWeight) => r.chargeableKg ?? r.revenueTonnes ?? r.grossKg;
					expect(new Decimal(figure(a)).gte(figure(b)), b.mode).toBe(true);
				});
			})
		);
	});
});
