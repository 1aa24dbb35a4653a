/**
 * A shipment's lines screened together: the worst regime, the actions to take (each once), which
 * products need a UN38.3 test summary, and whether anything is barred from passenger aircraft.
 *
 * Pure module: no framework imports.
 */
import type { TransportMode } from '../trade/shipment-status';
import { DANGEROUS_GOODS_CAUTION } from './caution';
import type { LithiumBatteryData } from './lithium-battery';
import {
	screenLithiumProduct,
	type LithiumRegime,
	type LithiumScreening,
	type ScreeningOptions
} from './lithium-screening';
import type { LithiumRequirement } from './requirements';

export interface LithiumShipmentLine {
	/** The product's battery data; its sku names the line in the summary. */
	product: LithiumBatteryData & { sku: string };
}

export interface LithiumShipmentAction extends LithiumRequirement {
	/** The SKUs the action is for. */
	skus: string[];
}

export interface LithiumShipmentSummary {
	mode: TransportMode;
	worst: LithiumRegime;
	lines: LithiumScreening[];
	/** Each action once, with the SKUs it concerns, in first-seen order. */
	actions: LithiumShipmentAction[];
	/** SKU → true when a UN38.3 test summary must be available for it. */
	un383SummaryBySku: Record<string, boolean>;
	forbiddenOnPassengerAircraft: boolean;
	/** SKUs with incomplete battery data (full regulation assumed). */
	incompleteSkus: string[];
	caution: string;
}

const RANK: Readonly<Record<LithiumRegime, number>> = Object.freeze({
	not_restricted: 0,
	reduced: 1,
	fully_regulated: 2
});

export function summariseLithiumShipment(
	lines: readonly LithiumShipmentLine[],
	mode: TransportMode,
	options: ScreeningOptions = {}
): LithiumShipmentSummary {
	const screened = lines.map((l) => screenLithiumProduct(l.product, mode, options));
	let worst: LithiumRegime = 'not_restricted';
	const actions = new Map<string, LithiumShipmentAction>();
	const un383: Record<string, boolean> = {};
	const incomplete = new Set<string>();
	for (const s of screened) {
		const sku = s.sku ?? '';
		if (RANK[s.regime] > RANK[worst]) worst = s.regime;
		un383[sku] = (un383[sku] ?? false) || s.un383SummaryRequired;
		if (s.classification?.dataIssues.length) incomplete.add(sku);
		for (const r of s.requirements) {
			if (!r.action) continue;
			// Same id, text and source: one action (texts name the UN number or PI where they differ).
			const key = [r.id, r.text, r.source.section].join('\u0000');
			const seen = actions.get(key);
			if (seen) {
				if (!seen.skus.includes(sku)) seen.skus.push(sku);
			} else actions.set(key, { ...r, skus: [sku] });
		}
	}
	return {
		mode,
		worst,
		lines: screened,
		actions: [...actions.values()],
		un383SummaryBySku: un383,
		forbiddenOnPassengerAircraft: screened.some((s) => s.forbiddenOnPassengerAircraft),
		incompleteSkus: [...incomplete],
		caution: DANGEROUS_GOODS_CAUTION
	};
}
