/**
 * Tariff lookup: per line, the row whose HS prefix is the longest prefix of the line's code wins
 * (the way national tariffs refine the WCO 6-digit subheadings; common practice in tariff
 * look-ups). Rows with an agreement are preferential: they apply only when a proof of origin is
 * claimed and the line's origin is one of the row's origins; a matching preferential row then
 * replaces the general rate. Only rows in force on the date count.
 */
import { whyNotInForce, type Context } from './context';
import { inForce } from './decimal';
import type { LandedCostLine, TariffRow } from './types';

export interface TariffIndex {
	inForce: Map<string, TariffRow[]>;
	/** Rows for a prefix that exist but are not in force, for a precise message. */
	stale: Map<string, TariffRow>;
}

export function indexTariff(rows: readonly TariffRow[], destination: string, date: string) {
	const index: TariffIndex = { inForce: new Map(), stale: new Map() };
	for (const row of rows) {
		if (row.destinationCountry !== destination) continue;
		if (!inForce(row, date)) {
			index.stale.set(row.hsPrefix, row);
			continue;
		}
		const list = index.inForce.get(row.hsPrefix);
		if (list) list.push(row);
		else index.inForce.set(row.hsPrefix, [row]);
	}
	return index;
}

function longest(
	index: TariffIndex,
	hsCode: string,
	accept: (row: TariffRow) => boolean
): TariffRow | undefined {
	for (let len = hsCode.length; len >= 2; len--) {
		const found = index.inForce.get(hsCode.slice(0, len))?.find(accept);
		if (found) return found;
	}
	return undefined;
}

export interface TariffChoice {
	row: TariffRow;
	preferential: boolean;
}

/** The row for a line, or null after recording what is missing. */
export function pickTariff(
	index: TariffIndex,
	line: LandedCostLine,
	lineIndex: number,
	preferenceClaimed: boolean,
	ctx: Context
): TariffChoice | null {
	if (preferenceClaimed) {
		const pref = longest(
			index,
			line.hsCode,
			(r) => r.agreement !== null && (r.originCountries ?? []).includes(line.originCountry)
		);
		if (pref) return { row: pref, preferential: true };
	}
	const general = longest(index, line.hsCode, (r) => r.agreement === null);
	if (general) return { row: general, preferential: false };
	let stale: TariffRow | undefined;
	for (let len = line.hsCode.length; len >= 2 && !stale; len--) {
		stale = index.stale.get(line.hsCode.slice(0, len));
	}
	ctx.miss(
		`lines[${lineIndex}].hsCode`,
		stale
			? `tariff row ${stale.id} for HS ${stale.hsPrefix} is ${whyNotInForce(stale, ctx.date)}; no row in force for HS ${line.hsCode} on ${ctx.date}`
			: `no tariff row for HS ${line.hsCode} in the destination's tariff`
	);
	return null;
}
