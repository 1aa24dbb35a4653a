import Decimal from 'decimal.js';
import { describe, it, expect } from 'vitest';
import {
	CONTAINER_CODES,
	PALLET_CODES,
	containerType,
	containerTypeSchema,
	containerTypes,
	isContainerCode,
	isPalletCode,
	palletType,
	palletTypeSchema,
	palletTypes,
	volumeM3,
	type ContainerType
} from './equipment';

function mustContainer(code: string): ContainerType {
	const found = containerType(code);
	if (found === undefined) throw new Error(`no container type ${code}`);
	return found;
}

// 1 in = 25.4 mm exactly: International Yard and Pound Agreement, 1959 (from memory).
const MM_PER_INCH = new Decimal('25.4');
const inchesToMm = (inches: number): Decimal => MM_PER_INCH.times(inches);

describe('pallet footprints: ISO 6780:2003, Table 1 (from memory)', () => {
	it('has exactly the six ISO 6780 footprints', () => {
		const footprints = palletTypes.map((p) => `${p.lengthMm}×${p.widthMm}`).sort();
		expect(footprints).toEqual(
			['1200×800', '1200×1000', '1219×1016', '1165×1165', '1100×1100', '1067×1067'].sort()
		);
	});

	it('rounds the inch footprints 48 × 40 in and 42 × 42 in to whole millimetres', () => {
		const p4840 = palletType('P4840');
		const p4242 = palletType('P4242');
		expect(p4840?.lengthMm).toBe(inchesToMm(48).round().toNumber()); // 1219.2
		expect(p4840?.widthMm).toBe(inchesToMm(40).round().toNumber()); // 1016.0
		expect(p4242?.lengthMm).toBe(inchesToMm(42).round().toNumber()); // 1066.8
	});

	it('matches the EUR pallet anchor', () => {
		// EPAL e.V., "EPAL Euro pallet (EPAL 1)" product specification: 1200 × 800 × 144 mm,
		// weight approx. 25 kg, safe working load 1500 kg (checked).
		const eur = palletType('P1208');
		expect(eur).toMatchObject({
			lengthMm: 1200,
			widthMm: 800,
			heightMm: 144,
			tareKg: '25',
			safeWorkingLoadKg: '1500'
		});
	});

	it('keeps deck heights in the common 144–150 mm band (common practice)', () => {
		for (const p of palletTypes) {
			expect(p.heightMm, p.code).toBeGreaterThanOrEqual(144);
			expect(p.heightMm, p.code).toBeLessThanOrEqual(150);
		}
	});

	it('has maxGross = tare + safe working load, exactly', () => {
		for (const p of palletTypes) {
			expect(new Decimal(p.tareKg).plus(p.safeWorkingLoadKg).equals(p.maxGrossKg), p.code).toBe(
				true
			);
		}
		expect(palletType('P1208')?.maxGrossKg).toBe('1525'); // 25 + 1500
	});

	it('has every code once and finds types by code', () => {
		expect(palletTypes.map((p) => p.code).sort()).toEqual([...PALLET_CODES].sort());
		expect(isPalletCode('P1210')).toBe(true);
		expect(isPalletCode('p1210')).toBe(false);
		expect(palletType('P9999')).toBeUndefined();
	});
});

describe('containers: ISO 668:2020, Table 1 (from memory)', () => {
	it.each([
		['C20GP', '1CC', { lengthMm: 6058, widthMm: 2438, heightMm: 2591 }],
		['C40GP', '1AA', { lengthMm: 12192, widthMm: 2438, heightMm: 2591 }],
		['C40HC', '1AAA', { lengthMm: 12192, widthMm: 2438, heightMm: 2896 }]
	])('%s (%s) external dimensions', (code, designation, external) => {
		const c = mustContainer(code);
		expect(c.iso668Designation).toBe(designation);
		expect(c.external).toEqual(external);
	});

	it('derives the ISO 668 external sizes from their nominal feet and inches', () => {
		// 40 ft, 8 ft, 8 ft 6 in and 9 ft 6 in, rounded to whole mm (ISO 668 gives mm values).
		expect(inchesToMm(40 * 12).toString()).toBe('12192');
		expect(
			inchesToMm(8 * 12)
				.round()
				.toNumber()
		).toBe(2438); // 2438.4
		expect(
			inchesToMm(8 * 12 + 6)
				.round()
				.toNumber()
		).toBe(2591); // 2590.8
		expect(
			inchesToMm(9 * 12 + 6)
				.round()
				.toNumber()
		).toBe(2896); // 2895.6
	});

	it('makes two 1CC plus the 76 mm coupling gap equal one 1AA length', () => {
		// ISO 668:2020: the 1C/1CC length is set so that two of them with the gap i = 76 mm
		// equal one 1A/1AA length (from memory; clause not checked).
		const c20 = mustContainer('C20GP');
		const c40 = mustContainer('C40GP');
		expect(2 * c20.external.lengthMm + 76).toBe(c40.external.lengthMm);
	});

	it('uses ISO 6346 size-type codes that agree with the dimensions', () => {
		// ISO 6346:1995, Annex E (from memory): first size character 2 = 20 ft, 4 = 40 ft;
		// second 2 = 8 ft 6 in (2591 mm), 5 = 9 ft 6 in (2896 mm); G1 = general purpose.
		expect(containerTypes.map((c) => [c.code, c.iso6346SizeType])).toEqual([
			['C20GP', '22G1'],
			['C40GP', '42G1'],
			['C40HC', '45G1']
		]);
		const lengthCode: Record<string, number> = { '2': 6058, '4': 12192 };
		const heightCode: Record<string, number> = { '2': 2591, '5': 2896 };
		for (const c of containerTypes) {
			expect(lengthCode[c.iso6346SizeType.charAt(0)], c.code).toBe(c.external.lengthMm);
			expect(heightCode[c.iso6346SizeType.charAt(1)], c.code).toBe(c.external.heightMm);
		}
	});

	it('has every code once and finds types by code', () => {
		expect(containerTypes.map((c) => c.code).sort()).toEqual([...CONTAINER_CODES].sort());
		expect(isContainerCode('C40HC')).toBe(true);
		expect(containerType('40HC')).toBeUndefined();
	});
});

describe('container payload arithmetic', () => {
	it.each([
		['C20GP', '30480', '2300', '28180'],
		['C40GP', '30480', '3750', '26730'],
		['C40HC', '30480', '3940', '26540']
	])('%s: %s − %s = %s kg', (code, gross, tare, payload) => {
		const c = mustContainer(code);
		expect(c.maxGrossKg).toBe(gross);
		expect(c.tareKg).toBe(tare);
		expect(c.maxPayloadKg).toBe(payload);
		expect(new Decimal(gross).minus(tare).toString()).toBe(payload);
	});

	it('rejects a record whose payload does not equal gross − tare', () => {
		const c20 = mustContainer('C20GP');
		const bad = { ...c20, maxPayloadKg: '28181' };
		expect(() => containerTypeSchema.parse(bad)).toThrow(/maxPayloadKg/);
	});

	it('rejects internal dimensions not smaller than external ones', () => {
		const c20 = mustContainer('C20GP');
		const bad = { ...c20, internal: { ...c20.internal, heightMm: 2591 } };
		expect(() => containerTypeSchema.parse(bad)).toThrow(/internal heightMm/);
	});

	it('rejects masses that are not decimal strings', () => {
		const c20 = mustContainer('C20GP');
		expect(() => containerTypeSchema.parse({ ...c20, tareKg: 2300 })).toThrow();
		expect(() => containerTypeSchema.parse({ ...c20, tareKg: '2,300' })).toThrow();
		expect(() => containerTypeSchema.parse({ ...c20, tareKg: '-1' })).toThrow();
	});

	it('rejects a pallet whose max gross is not tare + load', () => {
		const eur = palletType('P1208');
		expect(() => palletTypeSchema.parse({ ...eur, maxGrossKg: '1500' })).toThrow(/maxGrossKg/);
	});
});

describe('internal volume, exact from millimetres', () => {
	it('20 ft: 5896 × 2350 × 2393 mm = 33.1564508 m³ ≈ 33.2 m³', () => {
		const v = volumeM3(mustContainer('C20GP').internal);
		expect(v.toString()).toBe('33.1564508');
		expect(v.toDecimalPlaces(1).toString()).toBe('33.2');
	});

	it('40 ft and 40 ft high cube', () => {
		expect(volumeM3(mustContainer('C40GP').internal).toString()).toBe('67.6342784');
		expect(volumeM3(mustContainer('C40HC').internal).toString()).toBe('76.2582144');
	});

	it('EUR pallet footprint × deck height', () => {
		// 1200 × 800 × 144 mm = 0.13824 m³
		const eur = palletType('P1208');
		if (eur === undefined) throw new Error('no P1208');
		expect(volumeM3(eur).toString()).toBe('0.13824');
	});
});
