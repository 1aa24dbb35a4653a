/**
 * Where each equipment figure comes from, for the equipment screens: the basis (ISO standard,
 * maker's specification, common practice, computed) read from the `sources` notes in
 * data/*.json, and the reference value, so a figure changed in Landfall can say so.
 *
 * Pure module: no framework imports.
 */
import Decimal from 'decimal.js';
import { containerType, palletType } from './equipment';

export type Basis = 'ISO standard' | 'maker’s specification' | 'common practice' | 'computed';

export interface FigureSource {
	basis: Basis;
	/** Whether the cited text was read when the entry was written (data/README.md). */
	checked: boolean;
	note: string;
}

/** The basis a source note states: the tags are those data/README.md defines. */
export function basisOf(note: string): Basis {
	if (/^common practice/i.test(note)) return 'common practice';
	if (/^computed/i.test(note)) return 'computed';
	if (/specification/i.test(note) && !/^ISO/.test(note)) return 'maker’s specification';
	return 'ISO standard';
}

const source = (note: string): FigureSource => ({
	basis: basisOf(note),
	checked: /\(checked\)/.test(note),
	note
});

export type PalletFigure = 'footprint' | 'height' | 'tare' | 'load' | 'maxLoadedHeight';
export type ContainerFigure =
	'designation' | 'sizeType' | 'internal' | 'doorOpening' | 'tare' | 'maxGross' | 'maxPayload';

/** The reference pallet type's figures as the edit form holds them, with their sources. */
export function palletReference(code: string) {
	const p = palletType(code);
	if (!p) return null;
	return {
		values: {
			lengthMm: String(p.lengthMm),
			widthMm: String(p.widthMm),
			deckHeightMm: String(p.heightMm),
			tareKg: p.tareKg,
			maxGrossKg: p.maxGrossKg,
			maxLoadedHeightMm: String(p.maxLoadedHeightMm)
		},
		sources: Object.fromEntries(
			Object.entries(p.sources).map(([figure, note]) => [figure, source(note)])
		) as Record<PalletFigure, FigureSource>
	};
}

/** The reference container type's figures as the edit form holds them, with their sources. */
export function containerReference(code: string) {
	const c = containerType(code);
	if (!c) return null;
	return {
		values: {
			iso668Designation: c.iso668Designation,
			iso6346SizeType: c.iso6346SizeType,
			internalLengthMm: String(c.internal.lengthMm),
			internalWidthMm: String(c.internal.widthMm),
			internalHeightMm: String(c.internal.heightMm),
			doorWidthMm: String(c.doorOpening.widthMm),
			doorHeightMm: String(c.doorOpening.heightMm),
			tareKg: c.tareKg,
			maxGrossKg: c.maxGrossKg
		},
		sources: Object.fromEntries(
			Object.entries(c.sources)
				.filter(([figure]) => figure !== 'external')
				.map(([figure, note]) => [figure, source(note)])
		) as Record<ContainerFigure, FigureSource>
	};
}

/** True when a stored figure differs from the reference (numbers compared exactly, not as text). */
export function differs(stored: string, reference: string): boolean {
	if (/^\d+(\.\d+)?$/.test(stored) && /^\d+(\.\d+)?$/.test(reference))
		return !new Decimal(stored).equals(reference);
	return stored !== reference;
}

/**
 * The hint under a figure: its basis, or that it was changed in Landfall (with the data file's
 * figure), or, for a custom type, that it was entered here.
 */
export function figureHint(
	source: FigureSource | undefined,
	reference: string | undefined,
	stored: string | undefined,
	unit: string
): string {
	if (!source) return 'Entered in Landfall.';
	const sure = source.basis === 'ISO standard' || source.basis === 'maker’s specification';
	const basis = `${source.basis}${sure ? (source.checked ? ', checked' : ', from memory') : ''}`;
	if (reference !== undefined && stored !== undefined && differs(stored, reference))
		return `Changed in Landfall; the data file has ${reference} ${unit} (${basis}).`;
	return `${basis[0]!.toUpperCase()}${basis.slice(1)}.`;
}
