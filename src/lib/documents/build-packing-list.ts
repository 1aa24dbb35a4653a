/**
 * The packing list from a shipment that passed `readiness()`: one row per run of alike cartons,
 * split where the run moves to other pallets, so every row names its pallets.
 *
 * Pure module: no framework imports.
 */
import Decimal from 'decimal.js';
import type { MeasuredLine, MeasureResult } from '../packing';
import { buildHeader } from './header';
import type { DocumentSource, IssueStamp, SourceLot } from './source';
import type { PackingListSnapshot, PackingRow } from './types';

export const PACKING_LIST_CAUTIONS: readonly string[] = Object.freeze([
	'Weights and dimensions are computed from the product and packaging records. The shipper must ' +
		'still obtain the verified gross mass of each packed container by weighing (SOLAS chapter VI, ' +
		'regulation 2) before it is loaded on a ship.',
	'Cartons of lithium batteries or other dangerous goods travel only as the carrier and the ' +
		'applicable dangerous-goods regulations allow; trained staff prepare and mark them.'
]);

export const LOAD_PLAN_CAUTION =
	'The load-plan pictures are a computed proposal. How the container is actually stowed, ' +
	'braced and weight-distributed is for the carrier, the IMO/ILO/UNECE CTU Code and trained ' +
	'staff to decide.';

const kg = (d: Decimal) => d.toFixed(3, Decimal.ROUND_HALF_UP);
const m3 = (d: Decimal) => d.toFixed(3, Decimal.ROUND_HALF_UP);

function palletLabel(from: number, to: number): string {
	return from === to ? `P${from}` : `P${from}–P${to}`;
}

/** [fromCarton, toCarton, pallets label] runs of one line: split where the pallet group changes. */
function palletRuns(
	m: Extract<MeasureResult, { ok: true }>,
	line: MeasuredLine
): { from: number; to: number; firstPallet: number; perPallet: number }[] {
	const plan = m.pallets?.lines.find((l) => l.lineIndex === line.lineIndex)?.plan;
	if (!plan) return [];
	return plan.groups.map((g) => ({
		from: g.firstCarton,
		to: g.lastCarton,
		firstPallet: g.fromPallet,
		perPallet: g.cartonsPerPallet
	}));
}

function lotsText(lots: readonly SourceLot[], sku: string, from: number, to: number): string[] {
	return lots
		.filter((l) => l.sku === sku && l.cartonFrom <= to && l.cartonTo >= from)
		.map((l) => {
			const cartons =
				l.cartonFrom === l.cartonTo
					? `carton ${l.cartonFrom}`
					: `cartons ${l.cartonFrom}–${l.cartonTo}`;
			const serials = l.serialFrom ? `, serials ${l.serialFrom}–${l.serialTo}` : '';
			return `Lot ${l.lotNumber} (${cartons}${serials})`;
		});
}

export function buildPackingList(source: DocumentSource, stamp: IssueStamp): PackingListSnapshot {
	const m = source.measure;
	if (!m.ok) throw new Error('the shipment cannot be measured: run readiness() first');
	const rows: PackingRow[] = [];
	for (const line of m.lines) {
		const description = source.lines[line.lineIndex]?.description ?? line.sku;
		const runs = palletRuns(m, line);
		for (const g of line.groups) {
			// Cut the carton group where it crosses into another pallet group.
			const cuts = runs.length
				? runs
						.filter((r) => r.from <= g.toCarton && r.to >= g.fromCarton)
						.map((r) => ({
							...r,
							from: Math.max(r.from, g.fromCarton),
							to: Math.min(r.to, g.toCarton)
						}))
				: [{ from: g.fromCarton, to: g.toCarton, firstPallet: 0, perPallet: 0 }];
			for (const cut of cuts) {
				const cartons = cut.to - cut.from + 1;
				const run = runs.find((r) => r.from <= cut.from && r.to >= cut.to);
				const palletOf = (carton: number) =>
					run!.firstPallet + Math.floor((carton - run!.from) / run!.perPallet);
				rows.push({
					fromCarton: cut.from,
					toCarton: cut.to,
					cartons,
					sku: line.sku,
					description,
					unitsPerCarton: g.unitsPerCarton,
					units: cartons * g.unitsPerCarton,
					netKgPerCarton: g.netKgPerCarton,
					grossKgPerCarton: g.grossKgPerCarton,
					netKg: kg(new Decimal(g.netKgPerCarton).times(cartons)),
					grossKg: kg(new Decimal(g.grossKgPerCarton).times(cartons)),
					lengthMm: line.carton.lengthMm,
					widthMm: line.carton.widthMm,
					heightMm: line.carton.heightMm,
					volumeM3: m3(new Decimal(line.carton.volumeM3).times(cartons)),
					pallets: run ? palletLabel(palletOf(cut.from), palletOf(cut.to)) : null,
					lots: lotsText(source.lots, line.sku, cut.from, cut.to)
				});
			}
		}
	}
	const p = m.pallets;
	return {
		...buildHeader('packing_list', source, stamp, m.totals.cartons, [
			...PACKING_LIST_CAUTIONS,
			...(source.loadPlan ? [LOAD_PLAN_CAUTION] : [])
		]),
		kind: 'packing_list',
		rows,
		totals: {
			cartons: m.totals.cartons,
			units: m.totals.units,
			netKg: m.totals.netKg,
			grossKg: m.totals.grossKg,
			volumeM3: m3(new Decimal(m.totals.volumeM3)),
			pallets: p
				? {
						count: p.pallets,
						type: source.palletType ?? `${p.pallet.lengthMm} × ${p.pallet.widthMm} mm pallet`,
						tareKg: p.tareKg,
						grossKg: p.grossKg,
						volumeM3: m3(new Decimal(p.volumeM3))
					}
				: null
		},
		loadPlan: source.loadPlan
	};
}
