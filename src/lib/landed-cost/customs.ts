/**
 * The customs part, in the destination's currency: customs value per line by the valuation
 * basis, duty per line from the tariff, de minimis, fees and import VAT/GST. Per-line figures are
 * shares (largest remainder) of declaration totals, so they add up exactly.
 */
import type Decimal from 'decimal.js';
import { allocateLargestRemainder } from './allocate';
import type { Context } from './context';
import { deMinimis } from './de-minimis';
import { Exact, ZERO, digits, money, roundMinor, roundToRule, ruleWords } from './decimal';
import { lineDuty } from './duty';
import { customsFees } from './fees';
import type { Fx } from './fx';
import { indexTariff, pickTariff, type TariffChoice } from './tariff';
import type { CountryRules, LandedCostInput, VatBaseItem } from './types';
import { importVat } from './vat';

/** Amounts already converted to the customs currency. */
export interface CustomsInputs {
	goods: Decimal;
	originCharges: Decimal;
	freight: Decimal;
	insurance: Decimal;
	destinationCharges: Decimal;
	/** Weights for goods (line values) and for transport costs (the user's allocation). */
	valueWeights: Decimal[];
	allocWeights: Decimal[];
}

export interface CustomsResult {
	customsValue: Decimal;
	lineCustomsValue: Decimal[];
	choices: (TariffChoice | null)[];
	duty: Decimal;
	lineDutyWeights: Decimal[];
	fees: Decimal;
	vat: Decimal;
	lineVatWeights: Decimal[];
}

const sum = (xs: readonly Decimal[]) => xs.reduce((s, x) => s.plus(x), ZERO);
const addLines = (a: readonly Decimal[], b: readonly Decimal[]) => a.map((x, i) => x.plus(b[i]!));

export function assessCustoms(
	input: LandedCostInput,
	country: CountryRules,
	c: CustomsInputs,
	fx: Fx,
	ctx: Context
): CustomsResult {
	const C = country.currency;
	const minor = digits(C);
	const share = (total: Decimal, w: Decimal[]) => allocateLargestRemainder(total, w, minor);
	const cif = country.valuationBasis === 'CIF';
	const lineGoods = share(c.goods, c.valueWeights);
	const lineOrigin = share(c.originCharges, c.allocWeights);
	const lineFreight = share(c.freight, c.allocWeights);
	const lineInsurance = share(c.insurance, c.allocWeights);
	const lineTransport = addLines(addLines(lineOrigin, lineFreight), lineInsurance);
	const lineCv = cif ? addLines(lineGoods, lineTransport) : lineGoods;
	const customsValue = sum(lineCv);
	ctx.step({
		key: 'customs.value',
		label: `Customs value (${country.valuationBasis} basis, ${country.country})`,
		amount: money(customsValue, C),
		currency: C,
		formula: cif
			? `goods ${money(c.goods, C)} + origin charges ${money(c.originCharges, C)} + freight ${money(c.freight, C)} + insurance ${money(c.insurance, C)}`
			: `goods ${money(c.goods, C)} (freight and insurance to the border excluded)`,
		inputs: [{ label: 'valuation basis', value: country.valuationBasis }],
		rowId: country.id,
		source: country.source
	});

	const relief = deMinimis(country.deMinimis, customsValue, C, fx, ctx);
	if (relief.rule) {
		ctx.step({
			key: 'customs.de_minimis',
			label: 'De minimis',
			amount: money(customsValue, C),
			currency: C,
			formula: `${relief.words}: duty ${relief.duty ? 'relieved' : 'due'}, VAT ${relief.vat ? 'relieved' : 'due'}`,
			inputs: [{ label: 'date', value: ctx.date }],
			rowId: relief.rule.id,
			source: relief.rule.source
		});
	}

	const index = indexTariff(input.tariffRows, input.destinationCountry, ctx.date);
	const choices = input.lines.map((line, i) =>
		pickTariff(index, line, i, input.preferenceClaimed, ctx)
	);
	const baseRule = country.rounding.dutyBase;
	const lineDutyExact = input.lines.map((line, i) => {
		const choice = choices[i];
		if (!choice) return ZERO;
		ctx.used({
			kind: 'tariff',
			id: choice.row.id,
			source: choice.row.source,
			validFrom: choice.row.validFrom,
			validTo: choice.row.validTo
		});
		const d = choice.row.duty;
		const factor =
			d.kind === 'ad_valorem' ? new Exact(1) : (fx.quote(d.currency, C)?.factor ?? ZERO);
		const base = baseRule ? roundToRule(lineCv[i]!, baseRule) : lineCv[i]!;
		const duty = lineDuty(d, base, line, factor);
		const pref = choice.preferential ? ` (preference ${choice.row.agreement})` : '';
		ctx.step({
			key: `duty.line.${line.ref}`,
			label: `Duty, line ${line.ref} (HS ${line.hsCode} → ${choice.row.hsPrefix}${pref})`,
			amount: duty.amount.toString(),
			currency: C,
			formula: duty.formula + (baseRule ? `; base ${ruleWords(baseRule)}` : ''),
			inputs: [
				{ label: 'customs value', value: money(lineCv[i]!, C) },
				{ label: 'origin', value: line.originCountry }
			],
			rowId: choice.row.id,
			source: choice.row.source
		});
		return duty.amount;
	});
	const dutyExact = sum(lineDutyExact);
	const dutyRule = country.rounding.duty;
	const dutyRounded = dutyRule ? roundToRule(dutyExact, dutyRule) : roundMinor(dutyExact, C);
	const duty = relief.duty ? ZERO : dutyRounded;
	ctx.step({
		key: 'duty.total',
		label: 'Duty',
		amount: money(duty, C),
		currency: C,
		formula: relief.duty
			? 'relieved under de minimis'
			: `Σ line duties ${dutyExact.toString()}, ${dutyRule ? ruleWords(dutyRule) : 'half up to the minor unit'}`,
		inputs: [{ label: 'lines', value: String(input.lines.length) }]
	});
	const lineDuty_ = share(duty, lineDutyExact);

	// Fees are for formal entries: none when the shipment is under the duty de minimis.
	const feeRows = relief.duty ? [] : customsFees(country.fees, input.mode, customsValue, C, ctx);
	for (const f of feeRows) {
		ctx.step({
			key: `fee.${f.fee.code}`,
			label: f.fee.label,
			amount: money(f.amount, C),
			currency: C,
			formula: f.formula,
			inputs: [{ label: 'mode', value: input.mode }],
			rowId: f.fee.id,
			source: f.fee.source
		});
	}
	const fees = sum(feeRows.map((f) => f.amount));
	const lineFees = share(fees, lineCv);

	const has = (item: VatBaseItem) => country.vat.baseIncludes.includes(item);
	let vatBases = lineCv;
	if (has('duty')) vatBases = addLines(vatBases, lineDuty_);
	if (has('fees')) vatBases = addLines(vatBases, lineFees);
	if (!cif && has('origin_charges')) vatBases = addLines(vatBases, lineOrigin);
	if (!cif && has('freight')) vatBases = addLines(vatBases, lineFreight);
	if (!cif && has('insurance')) vatBases = addLines(vatBases, lineInsurance);
	if (has('destination_charges')) {
		vatBases = addLines(vatBases, share(c.destinationCharges, c.allocWeights));
	}
	const vatResult = importVat(
		country,
		vatBases,
		input.lines.map((l) => l.hsCode)
	);
	for (const g of vatResult.groups) {
		ctx.step({
			key: `vat.${g.ratePercent}`,
			label: `Import ${country.vat.label} at ${g.ratePercent} %`,
			amount: money(relief.vat ? ZERO : g.vat, C),
			currency: C,
			formula: relief.vat
				? 'relieved under de minimis'
				: `${g.formula}; base = customs value + ${country.vat.baseIncludes.join(' + ') || 'nothing'}`,
			inputs: [{ label: 'base', value: money(g.base, C) }],
			rowId: country.id,
			source: country.source
		});
	}
	return {
		customsValue,
		lineCustomsValue: lineCv,
		choices,
		duty,
		lineDutyWeights: lineDutyExact,
		fees,
		vat: relief.vat ? ZERO : vatResult.total,
		lineVatWeights: vatResult.lineWeights
	};
}
