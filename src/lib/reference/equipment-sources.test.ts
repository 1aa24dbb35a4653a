import { describe, expect, it } from 'vitest';
import {
	basisOf,
	containerReference,
	differs,
	figureHint,
	palletReference
} from './equipment-sources';

// The bases are the tags data/README.md ("How sure each figure is") defines for data/*.json.
describe('equipment figure sources', () => {
	it('reads the basis from the source notes', () => {
		expect(basisOf('ISO 6780:2003, Table 1 (footprint 1200 × 800 mm); from memory')).toBe(
			'ISO standard'
		);
		expect(basisOf('common practice: planning default')).toBe('common practice');
		expect(basisOf('computed: maxGrossKg − tareKg')).toBe('computed');
		expect(basisOf('EPAL e.V., EPAL 3 pallet product specification: weight approx. 30 kg')).toBe(
			'maker’s specification'
		);
	});

	it('marks the EUR pallet: ISO footprint, checked maker figures, common-practice height limit', () => {
		const eur = palletReference('P1208')!;
		expect(eur.values).toMatchObject({ lengthMm: '1200', widthMm: '800', tareKg: '25' });
		expect(eur.sources.footprint).toMatchObject({ basis: 'ISO standard', checked: false });
		expect(eur.sources.tare).toMatchObject({ basis: 'maker’s specification', checked: true });
		expect(eur.sources.maxLoadedHeight.basis).toBe('common practice');
	});

	it('marks the 20 ft container: ISO designation, common-practice inside and door, computed payload', () => {
		const c20 = containerReference('C20GP')!;
		expect(c20.values).toMatchObject({ iso668Designation: '1CC', doorWidthMm: '2340' });
		expect(c20.sources.designation.basis).toBe('ISO standard');
		expect(c20.sources.internal.basis).toBe('common practice');
		expect(c20.sources.doorOpening.basis).toBe('common practice');
		expect(c20.sources.maxPayload.basis).toBe('computed');
		expect(containerReference('NOPE')).toBeNull();
	});

	it('compares stored NUMERIC text with reference figures exactly', () => {
		expect(differs('25.000', '25')).toBe(false);
		expect(differs('25.001', '25')).toBe(true);
		expect(differs('22G1', '22G1')).toBe(false);
	});
});

describe('figure hints', () => {
	const tare = palletReference('P1208')!.sources.tare;
	it('names the basis, or the data file figure once changed in Landfall', () => {
		expect(figureHint(tare, '25', '25.000', 'kg')).toBe('Maker’s specification, checked.');
		expect(figureHint(tare, '25', '27.500', 'kg')).toBe(
			'Changed in Landfall; the data file has 25 kg (maker’s specification, checked).'
		);
		expect(figureHint(undefined, undefined, '27', 'kg')).toBe('Entered in Landfall.');
		expect(figureHint(containerReference('C20GP')!.sources.internal, '5896', '5896', 'mm')).toBe(
			'Common practice.'
		);
	});
});
