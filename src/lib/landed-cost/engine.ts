/**
 * landedCost(input): the landed cost of a shipment for one mode, with who bears each cost, the
 * per-line and per-unit split, and an explanation trail. Missing, expired or malformed data
 * gives `{ ok: false, missing }` naming each gap; no figure is computed with a stand-in zero.
 *
 * Order: goods → freight, surcharges, origin and destination charges, brokerage (each piece in
 * its currency, converted with a stated rate) → insurance on CFR (insurance.ts) → customs value,
 * duty, de minimis, fees, VAT in the customs currency (customs.ts) → conversion to the report
 * currency → per-line shares → carrying cost and emissions.
 */
import type Decimal from 'decimal.js';
import { bearer } from './bearer';
import { cautionsFor } from './cautions';
import { chargePiece, type Quantities } from './charges';
import { Context } from './context';
import { assessCustoms } from './customs';
import { Exact, ZERO, money, roundMinor } from './decimal';
import { carryingCost, emissionsKg } from './extras';
import { baseFreight, minimumWm, revenueTonnes } from './freight';
import { Fx } from './fx';
import { insurancePremium } from './insurance';
import { perLine, type Shares } from './per-line';
import { tracePiece, type Piece } from './piece';
import {
	COST_KEYS,
	type ComponentFigure,
	type CostKey,
	type LandedCostInput,
	type LandedCostResult
} from './types';
import { validateInput } from './validate';

const sum = (xs: readonly Decimal[]) => xs.reduce((s, x) => s.plus(x), ZERO);

export function landedCost(input: LandedCostInput): LandedCostResult {
	const ctx = new Context(input.date);
	validateInput(input, ctx);
	if (ctx.failed || input.rateCard === null || input.country === null) {
		return { ok: false, missing: ctx.missing };
	}
	const card = input.rateCard;
	const country = input.country;
	const { id, source, validFrom, validTo } = card;
	ctx.used({ kind: 'rate_card', id, source, validFrom, validTo });
	ctx.used({
		kind: 'country',
		id: country.id,
		source: country.source,
		validFrom: country.validFrom,
		validTo: country.validTo
	});
	const R = input.reportCurrency;
	const C = country.currency;
	const G = input.goodsCurrency;
	const fx = new Fx(input.exchangeRates, ctx);

	// Goods, line by line in the goods currency.
	const lineValues = input.lines.map((l) =>
		roundMinor(new Exact(l.unitPrice).times(l.quantity), G)
	);
	const goodsNative = sum(lineValues);
	ctx.step({
		key: 'goods',
		label: 'Goods value',
		amount: money(goodsNative, G),
		currency: G,
		formula: `Σ quantity × unit price over ${input.lines.length} lines, each half up to the minor unit`,
		inputs: [{ label: 'lines', value: String(input.lines.length) }]
	});
	const allocWeights =
		input.allocation === 'weight' ? input.lines.map((l) => new Exact(l.grossKg)) : lineValues;

	// Transport pieces in their own currencies.
	const m = input.measures;
	const grossKg = new Exact(m.grossKg);
	const q: Quantities = {
		grossKg,
		chargeableKg: new Exact(m.chargeableKg),
		revenueTonnes: revenueTonnes(grossKg, new Exact(m.volumeM3), minimumWm(card)),
		pallets: m.pallets,
		containers: m.containers
	};
	const base = baseFreight(card, q, ctx);
	const freightBase = { amount: base?.amount ?? ZERO, currency: card.currency };
	const pieces = (list: typeof card.surcharges, key: string, rowId?: string, src?: string) =>
		list.map((ch, i) => chargePiece(ch, q, freightBase, `${key}.${i}`, rowId, src));
	const freightPieces: Piece[] = [
		...(base ? [base] : []),
		...pieces(card.surcharges, 'freight.surcharge', card.id, card.source)
	];
	const originPieces = pieces(card.originCharges, 'origin', card.id, card.source);
	const destPieces = pieces(card.destinationCharges, 'destination', card.id, card.source);
	const brokerPieces = pieces(input.brokerage, 'brokerage');
	const convertAll = (list: Piece[], to: string) =>
		sum(
			list.map((p) => {
				if (to === R) tracePiece(ctx, p);
				return fx.convert(p.amount, p.currency, to, p.key, p.label);
			})
		);
	const goodsR = fx.convert(goodsNative, G, R, 'goods', 'Goods value');
	const originR = convertAll(originPieces, R);
	const freightR = convertAll(freightPieces, R);
	const destR = convertAll(destPieces, R);
	const brokerR = convertAll(brokerPieces, R);

	const cfr = goodsR.plus(originR).plus(freightR);
	const ins = insurancePremium(cfr, input.insurance, R);
	ctx.step({
		key: 'insurance',
		label: 'Cargo insurance premium',
		amount: money(ins.premium, R),
		currency: R,
		formula: `${input.insurance.ratePercent} % × insured value ${money(ins.insuredValue, R)} (= (100 + ${input.insurance.upliftPercent}) % × CIF ${money(ins.cif, R)}, CIF = CFR ${money(cfr, R)} / (1 − ${input.insurance.upliftPercent === '10' ? '1.1' : `(1 + ${input.insurance.upliftPercent} %)`} × ${input.insurance.ratePercent} %))${ins.minimumApplied ? `, minimum premium ${input.insurance.minimumPremium}` : ''}`,
		inputs: [
			{ label: 'CFR', value: money(cfr, R) },
			{ label: 'rate', value: `${input.insurance.ratePercent} %` }
		],
		source: input.insurance.source
	});

	const toC = (list: Piece[]) => (R === C ? null : convertAll(list, C));
	const customs = assessCustoms(
		input,
		country,
		{
			goods: fx.convert(goodsNative, G, C, 'goods', 'Goods value'),
			originCharges: toC(originPieces) ?? originR,
			freight: toC(freightPieces) ?? freightR,
			insurance: fx.convert(ins.premium, R, C, 'insurance', 'Insurance premium'),
			destinationCharges: toC(destPieces) ?? destR,
			valueWeights: lineValues,
			allocWeights
		},
		fx,
		ctx
	);
	const dutyR = fx.convert(customs.duty, C, R, 'duty', 'Duty');
	const vatR = fx.convert(customs.vat, C, R, 'vat', `Import ${country.vat.label}`);
	const feesR = fx.convert(customs.fees, C, R, 'fees', 'Customs fees');
	const cvR = fx.convert(customs.customsValue, C, R, 'customs_value', 'Customs value');

	// Emissions need a distance when a factor is given.
	const distance = input.distanceKm ?? card.distanceKm;
	const factor = input.emissionFactor;
	if (factor !== null && distance === null) {
		ctx.miss('distanceKm', `no distance for the lane ${card.laneFrom} → ${card.laneTo}`);
	}
	if (ctx.failed) return { ok: false, missing: ctx.missing };

	const totals: Record<CostKey, Decimal> = {
		goods: goodsR,
		originCharges: originR,
		freight: freightR,
		insurance: ins.premium,
		duty: dutyR,
		vat: vatR,
		fees: feesR,
		brokerage: brokerR,
		destinationCharges: destR
	};
	const assessed: Partial<Record<CostKey, Decimal>> = {
		duty: customs.duty,
		vat: customs.vat,
		fees: customs.fees
	};
	const components = {} as Record<CostKey, ComponentFigure>;
	let total = ZERO;
	let seller = ZERO;
	for (const key of COST_KEYS) {
		const who = bearer(key, input.incoterm);
		const a = assessed[key];
		components[key] = {
			amount: money(totals[key], R),
			currency: R,
			bearer: who,
			...(a === undefined ? {} : { assessed: { amount: money(a, C), currency: C } })
		};
		total = total.plus(totals[key]);
		if (who === 'seller') seller = seller.plus(totals[key]);
	}
	ctx.step({
		key: 'total',
		label: 'Total landed cost',
		amount: money(total, R),
		currency: R,
		formula: COST_KEYS.map((k) => `${k} ${components[k].amount}`).join(' + '),
		inputs: [{ label: 'incoterm', value: input.incoterm }]
	});

	const shares: Shares = {
		goods: { total: goodsR, weights: lineValues },
		originCharges: { total: originR, weights: allocWeights },
		freight: { total: freightR, weights: allocWeights },
		insurance: { total: ins.premium, weights: allocWeights },
		duty: { total: dutyR, weights: customs.lineDutyWeights },
		vat: { total: vatR, weights: customs.lineVatWeights },
		fees: { total: feesR, weights: customs.lineCustomsValue },
		brokerage: { total: brokerR, weights: allocWeights },
		destinationCharges: { total: destR, weights: allocWeights }
	};
	const lines = perLine(
		input.lines,
		shares,
		customs.lineCustomsValue.map((v) => ({ amount: money(v, C), currency: C })),
		customs.choices.map((c) => c?.row.id ?? ''),
		R
	);

	const carrying = carryingCost(goodsR, input.carryingRatePercent, card.transitDays, R);
	ctx.step({
		key: 'carrying',
		label: 'Carrying cost in transit',
		amount: money(carrying, R),
		currency: R,
		formula: `goods ${money(goodsR, R)} × ${input.carryingRatePercent} % × ${card.transitDays} days / 365`,
		inputs: [{ label: 'transit days', value: String(card.transitDays) }],
		rowId: card.id
	});
	let emissions: string | null = null;
	if (factor !== null && distance !== null) {
		const kg = emissionsKg(grossKg, new Exact(distance), new Exact(factor.gCo2ePerTonneKm));
		emissions = kg.toFixed(3);
		const { id: fid, source: fsrc, validFrom: ffrom, validTo: fto } = factor;
		ctx.used({ kind: 'emission', id: fid, source: fsrc, validFrom: ffrom, validTo: fto });
		ctx.step({
			key: 'emissions',
			label: 'Transport emissions (kg CO2e)',
			amount: emissions,
			currency: 'kg CO2e',
			formula: `${grossKg.dividedBy(1000).toString()} t × ${distance} km × ${factor.gCo2ePerTonneKm} g/t·km / 1000`,
			inputs: [{ label: 'mode', value: input.mode }],
			rowId: factor.id,
			source: factor.source
		});
	}

	return {
		ok: true,
		date: input.date,
		mode: input.mode,
		incoterm: input.incoterm,
		reportCurrency: R,
		customsCurrency: C,
		components,
		customsValue: {
			amount: money(cvR, R),
			currency: R,
			assessed: { amount: money(customs.customsValue, C), currency: C }
		},
		total: { amount: money(total, R), currency: R },
		sellerCosts: { amount: money(seller, R), currency: R },
		landedCostToBuyer: { amount: money(total.minus(seller), R), currency: R },
		perLine: lines,
		transitDays: card.transitDays,
		carryingCost: { amount: money(carrying, R), currency: R },
		emissionsKgCo2e: emissions,
		asOf: { date: input.date, data: ctx.data },
		cautions: cautionsFor(input),
		trail: ctx.trail
	};
}
