/**
 * The landed-cost engine's input for a stored shipment and one mode: its lines and measures, the
 * containers of its load plan (full-container sea freight), and the reference rows for its lane,
 * destination and date. Staff only; scoped like the shipment.
 */
import type { LandedCostInput, TransportMode } from '../../../landed-cost/types';
import { isIncoterm } from '../../../trade/incoterms';
import type { SessionUser } from '../../auth/session-user';
import { shipmentLoadPlan } from '../load-plan';
import { measureShipment } from '../shipment-measure';
import { productsBySku } from '../products';
import {
	countryRules,
	emissionFactor,
	exchangeRates,
	findRateCard,
	landedCostSettings,
	tariffRows
} from './reference';

export interface InputOptions {
	/** The date the estimate is for; today (UTC) when absent. */
	date?: string;
	allocation?: 'weight' | 'value';
	preferenceClaimed?: boolean;
	carryingRatePercent?: string;
	/** Currency of the figures; the shipment's when absent. */
	reportCurrency?: string;
}

export type InputOutcome =
	| { ok: true; input: LandedCostInput; reference: string }
	| { ok: false; status: 404 | 409; message: string; missing: { path: string; message: string }[] };

export async function shipmentLandedCostInput(
	user: SessionUser,
	shipmentId: string,
	mode: TransportMode,
	options: InputOptions = {}
): Promise<InputOutcome> {
	const measured = await measureShipment(user, shipmentId);
	if (!measured)
		return {
			ok: false,
			status: 404,
			message: 'No shipment with this id is visible to you.',
			missing: []
		};
	const { shipment: s, result } = measured;
	const refuse = (message: string, missing: { path: string; message: string }[] = []) =>
		({ ok: false, status: 409, message, missing }) as const;
	if (!result.ok)
		return refuse(
			'The shipment cannot be measured yet; correct its lines or products.',
			result.problems
		);
	if (!s.origin || !s.destination) return refuse('The shipment has no origin or destination.');
	if (!isIncoterm(s.incoterm)) return refuse('The shipment has no Incoterms rule.');
	const date = options.date ?? new Date().toISOString().slice(0, 10);
	const chargeable = result.chargeable.find((c) => c.mode === mode);

	let containers: { typeCode: string; count: number }[] = [];
	if (mode === 'sea_fcl') {
		// Full-container freight is per container: the load plan says how many of which type.
		const plan = await shipmentLoadPlan(user, shipmentId);
		if (!plan.ok) return refuse(`No load plan for full-container freight: ${plan.message}`);
		containers = plan.value.plan.containerCounts.map((c) => ({
			typeCode: c.containerTypeId,
			count: c.count
		}));
	}

	const destination = s.destination.countryCode;
	const [products, rateCard, tariff, country, fx, factor, settings] = await Promise.all([
		productsBySku(s.lines.map((l) => l.sku)),
		findRateCard(mode, s.origin, s.destination, date),
		tariffRows(destination, date),
		countryRules(destination, date),
		exchangeRates(date),
		emissionFactor(mode, date),
		landedCostSettings()
	]);
	if (!settings) return refuse('Finance has not set the landed-cost assumptions yet.');
	const input: LandedCostInput = {
		date,
		mode,
		reportCurrency: options.reportCurrency ?? s.currency,
		incoterm: s.incoterm,
		originCountry: s.origin.countryCode,
		destinationCountry: destination,
		goodsCurrency: s.currency,
		lines: result.lines.map((m) => {
			const line = s.lines[m.lineIndex]!;
			return {
				ref: String(line.position),
				sku: line.sku,
				hsCode: line.hsCode,
				originCountry: products.get(line.sku.toLowerCase())?.originCountry ?? '',
				quantity: line.quantity,
				unitPrice: line.unitPrice,
				netKg: m.netKg,
				grossKg: m.grossKg
			};
		}),
		measures: {
			grossKg: result.pallets?.grossKg ?? result.totals.grossKg,
			volumeM3: result.pallets?.volumeM3 ?? result.totals.volumeM3,
			chargeableKg: chargeable?.chargeableKg ?? chargeable?.grossKg ?? result.totals.grossKg,
			pallets: result.pallets?.pallets ?? 0,
			containers
		},
		rateCard,
		tariffRows: tariff,
		preferenceClaimed: options.preferenceClaimed ?? false,
		country,
		exchangeRates: fx,
		insurance: settings.insurance,
		allocation: options.allocation ?? settings.allocation,
		brokerage: settings.brokerage[destination] ?? [],
		carryingRatePercent: options.carryingRatePercent ?? settings.carryingRatePercent,
		emissionFactor: factor,
		distanceKm: null
	};
	return { ok: true, input, reference: s.reference };
}
