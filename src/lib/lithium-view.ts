/**
 * Turns lithium screenings into the rows and actions the guidance card shows. Pure module.
 */
import {
	DANGEROUS_GOODS_CAUTION,
	screenLithiumProduct,
	summariseLithiumShipment,
	type LithiumBatteryData,
	type LithiumRegime,
	type LithiumScreening,
	type LithiumShipmentAction
} from './dangerous-goods';
import { TRANSPORT_MODE_LABELS, type TransportMode } from './trade/shipment-status';

export interface LithiumView {
	caution: string;
	rows: { label: string; unNumber: string; regime: LithiumRegime; detail: string }[];
	actions: LithiumShipmentAction[];
	warnings: string[];
}

function detail(s: LithiumScreening): string {
	if (s.air) {
		const a = s.air;
		return [
			`IATA PI ${a.packingInstruction}, Section ${a.section}`,
			a.cargoAircraftOnly ? 'cargo aircraft only' : 'passenger or cargo aircraft',
			a.stateOfCharge !== 'none'
				? `state of charge at most ${a.stateOfChargeLimitPercent} % (${a.stateOfCharge})`
				: null,
			a.dangerousGoodsDeclaration ? "shipper's declaration needed" : 'no declaration'
		]
			.filter(Boolean)
			.join('; ');
	}
	if (s.surface) {
		const f = s.surface;
		return `${f.code} ${f.regime === 'sp188' ? 'special provision 188 may apply' : 'class 9'}, packing instruction ${f.packingInstruction}`;
	}
	return '';
}

const GUIDANCE_MODES: TransportMode[] = ['air', 'sea_fcl', 'road'];

/** A product's battery screened for air, sea and road; null when it has none. */
export function productLithiumView(
	product: LithiumBatteryData & { sku: string }
): LithiumView | null {
	const screenings = GUIDANCE_MODES.map((m) => screenLithiumProduct(product, m));
	if (!screenings[0]!.classification) return null;
	const actions = new Map<string, LithiumShipmentAction>();
	for (const s of screenings)
		for (const r of s.requirements)
			if (r.action && !actions.has(r.id)) actions.set(r.id, { ...r, skus: [] });
	return {
		caution: DANGEROUS_GOODS_CAUTION,
		rows: screenings.map((s) => ({
			label: s.mode === 'sea_fcl' ? 'Sea' : TRANSPORT_MODE_LABELS[s.mode],
			unNumber: `${s.classification!.unNumber} ${s.classification!.properShippingName}`,
			regime: s.regime,
			detail: detail(s)
		})),
		actions: [...actions.values()],
		warnings: screenings[0]!.forbiddenOnPassengerAircraft
			? ['Batteries on their own are forbidden on passenger aircraft: by air, cargo aircraft only.']
			: []
	};
}

/** A shipment's lithium lines screened for its mode; null when no line carries a battery. */
export function shipmentLithiumView(
	products: (LithiumBatteryData & { sku: string })[],
	mode: TransportMode
): LithiumView | null {
	const summary = summariseLithiumShipment(
		products.map((product) => ({ product })),
		mode
	);
	const lines = summary.lines.filter((l) => l.classification);
	if (lines.length === 0) return null;
	const warnings: string[] = [];
	if (summary.forbiddenOnPassengerAircraft && (mode === 'air' || mode === 'courier'))
		warnings.push('Batteries on their own travel by cargo aircraft only: tell the forwarder.');
	if (summary.incompleteSkus.length > 0)
		warnings.push(
			`Battery data is incomplete for ${summary.incompleteSkus.join(', ')}: full regulation is assumed until it is completed.`
		);
	return {
		caution: summary.caution,
		rows: lines.map((s) => ({
			label: s.sku ?? '',
			unNumber: `${s.classification!.unNumber} ${s.classification!.properShippingName}`,
			regime: s.regime,
			detail: detail(s)
		})),
		actions: summary.actions.filter((a) => a.action),
		warnings
	};
}
