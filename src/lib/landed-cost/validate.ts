/**
 * Checks the input's shape before any figure is computed: decimal strings, whole counts, known
 * currencies, HS codes, dates, and that the rate card and country rules exist, fit the mode and
 * are in force. Every problem is reported with its input path.
 */
import { isPaymentCurrency } from '../reference/currencies';
import { isIncoterm } from '../trade/incoterms';
import { CHARGE_MODES } from '../packing/chargeable';
import { whyNotInForce, type Context } from './context';
import { inForce, isDecimalString, percent } from './decimal';
import type { Charge, LandedCostInput } from './types';

const DATE = /^\d{4}-\d{2}-\d{2}$/;
const HS = /^\d{6,10}$/;

function checker(ctx: Context) {
	return {
		amount(path: string, value: unknown, allowNegative = false) {
			if (!isDecimalString(value)) ctx.miss(path, 'must be a decimal string such as "12.50"');
			else if (!allowNegative && value.startsWith('-')) ctx.miss(path, 'must not be negative');
		},
		count(path: string, value: unknown, min = 0) {
			if (!Number.isSafeInteger(value) || (value as number) < min) {
				ctx.miss(path, `must be a whole number of at least ${min}`);
			}
		},
		currency(path: string, value: unknown) {
			if (!isPaymentCurrency(value)) ctx.miss(path, 'must be an ISO 4217 currency code');
		}
	};
}

function checkCharges(ctx: Context, path: string, charges: readonly Charge[] | undefined) {
	const c = checker(ctx);
	if (!Array.isArray(charges)) return ctx.miss(path, 'must be a list of charges');
	charges.forEach((ch, i) => {
		c.amount(`${path}[${i}].amount`, ch.amount);
		if (ch.basis !== 'percent_of_freight') c.currency(`${path}[${i}].currency`, ch.currency);
		if (ch.minimum !== undefined) c.amount(`${path}[${i}].minimum`, ch.minimum);
	});
}

function checkRateCard(ctx: Context, input: LandedCostInput) {
	const card = input.rateCard;
	if (card === null) {
		const lane = `${input.originCountry} → ${input.destinationCountry}`;
		return ctx.miss('rateCard', `no rate card for the lane ${lane} and mode ${input.mode}`);
	}
	const c = checker(ctx);
	if (card.mode !== input.mode) {
		ctx.miss('rateCard.mode', `rate card ${card.id} is for ${card.mode}, not ${input.mode}`);
	}
	if (!inForce(card, input.date)) {
		ctx.miss('rateCard', `rate card ${card.id} is ${whyNotInForce(card, input.date)}`);
	}
	c.currency('rateCard.currency', card.currency);
	c.count('rateCard.transitDays', card.transitDays);
	if (card.distanceKm !== null) c.amount('rateCard.distanceKm', card.distanceKm);
	checkCharges(ctx, 'rateCard.surcharges', card.surcharges);
	checkCharges(ctx, 'rateCard.originCharges', card.originCharges);
	checkCharges(ctx, 'rateCard.destinationCharges', card.destinationCharges);
	switch (card.mode) {
		case 'air':
			c.amount('rateCard.minimumCharge', card.minimumCharge);
			card.breaks.forEach((b, i) => {
				c.amount(`rateCard.breaks[${i}].fromKg`, b.fromKg);
				c.amount(`rateCard.breaks[${i}].ratePerKg`, b.ratePerKg);
			});
			break;
		case 'sea_fcl':
			card.containerRates.forEach((r, i) =>
				c.amount(`rateCard.containerRates[${i}].ratePerContainer`, r.ratePerContainer)
			);
			break;
		case 'sea_lcl':
			c.amount('rateCard.ratePerWm', card.ratePerWm);
			c.amount('rateCard.minimumWm', card.minimumWm);
			c.amount('rateCard.minimumCharge', card.minimumCharge);
			break;
		case 'road':
			c.amount('rateCard.rate', card.rate);
			c.amount('rateCard.minimumCharge', card.minimumCharge);
			break;
		case 'courier':
			c.amount('rateCard.firstHalfKg', card.firstHalfKg);
			c.amount('rateCard.additionalHalfKg', card.additionalHalfKg);
			break;
	}
}

function checkCountry(ctx: Context, input: LandedCostInput) {
	const country = input.country;
	if (country === null) {
		return ctx.miss('country', `no import rules for ${input.destinationCountry}`);
	}
	if (!inForce(country, input.date)) {
		ctx.miss('country', `import rules ${country.id} are ${whyNotInForce(country, input.date)}`);
	}
	const c = checker(ctx);
	c.currency('country.currency', country.currency);
	c.amount('country.vat.ratePercent', country.vat.ratePercent);
	country.vat.reduced.forEach((r, i) =>
		c.amount(`country.vat.reduced[${i}].ratePercent`, r.ratePercent)
	);
	for (const [name, rule] of Object.entries(country.rounding)) {
		if (rule === undefined) continue;
		c.amount(`country.rounding.${name}.multiple`, rule.multiple);
		if (isDecimalString(rule.multiple) && Number(rule.multiple) <= 0) {
			ctx.miss(`country.rounding.${name}.multiple`, 'must be greater than zero');
		}
	}
	country.fees.forEach((f, i) => {
		const path = `country.fees[${i}]`;
		if (f.kind === 'ad_valorem') c.amount(`${path}.ratePercent`, f.ratePercent);
		else c.amount(`${path}.amount`, f.amount);
		if (f.min !== null) c.amount(`${path}.min`, f.min);
		if (f.max !== null) c.amount(`${path}.max`, f.max);
	});
	country.deMinimis.forEach((d, i) => {
		c.currency(`country.deMinimis[${i}].currency`, d.currency);
		if (d.dutyUpTo !== null) c.amount(`country.deMinimis[${i}].dutyUpTo`, d.dutyUpTo);
		if (d.vatUpTo !== null) c.amount(`country.deMinimis[${i}].vatUpTo`, d.vatUpTo);
	});
}

export function validateInput(input: LandedCostInput, ctx: Context): void {
	const c = checker(ctx);
	if (!DATE.test(input.date)) ctx.miss('date', 'must be a date YYYY-MM-DD');
	if (!CHARGE_MODES.includes(input.mode)) ctx.miss('mode', `unknown mode ${String(input.mode)}`);
	if (!isIncoterm(input.incoterm)) ctx.miss('incoterm', 'must be an Incoterms 2020 code');
	c.currency('reportCurrency', input.reportCurrency);
	c.currency('goodsCurrency', input.goodsCurrency);
	if (!Array.isArray(input.lines) || input.lines.length === 0) {
		ctx.miss('lines', 'the shipment has no lines');
	} else {
		input.lines.forEach((line, i) => {
			if (!HS.test(line.hsCode)) ctx.miss(`lines[${i}].hsCode`, 'must be 6 to 10 digits');
			c.count(`lines[${i}].quantity`, line.quantity, 1);
			c.amount(`lines[${i}].unitPrice`, line.unitPrice);
			c.amount(`lines[${i}].netKg`, line.netKg);
			c.amount(`lines[${i}].grossKg`, line.grossKg);
		});
	}
	const m = input.measures;
	c.amount('measures.grossKg', m.grossKg);
	c.amount('measures.volumeM3', m.volumeM3);
	c.amount('measures.chargeableKg', m.chargeableKg);
	c.count('measures.pallets', m.pallets);
	m.containers.forEach((box, i) => c.count(`measures.containers[${i}].count`, box.count, 1));
	c.amount('insurance.ratePercent', input.insurance.ratePercent);
	c.amount('insurance.upliftPercent', input.insurance.upliftPercent);
	if (input.insurance.minimumPremium !== null) {
		c.amount('insurance.minimumPremium', input.insurance.minimumPremium);
	}
	const { ratePercent, upliftPercent } = input.insurance;
	if (isDecimalString(ratePercent) && isDecimalString(upliftPercent)) {
		const cover = percent(upliftPercent).plus(1).times(ratePercent);
		if (cover.gte(100))
			ctx.miss('insurance.ratePercent', 'rate × (1 + uplift) must be below 100 %');
	}
	c.amount('carryingRatePercent', input.carryingRatePercent);
	if (input.distanceKm !== null) c.amount('distanceKm', input.distanceKm);
	if (input.emissionFactor !== null) {
		c.amount('emissionFactor.gCo2ePerTonneKm', input.emissionFactor.gCo2ePerTonneKm);
	}
	input.exchangeRates.forEach((r, i) => {
		c.amount(`exchangeRates[${i}].rate`, r.rate);
		if (isDecimalString(r.rate) && Number(r.rate) <= 0) {
			ctx.miss(`exchangeRates[${i}].rate`, 'must be greater than zero');
		}
	});
	input.tariffRows.forEach((t, i) => {
		const d = t.duty;
		if (d.kind !== 'specific') c.amount(`tariffRows[${i}].duty.ratePercent`, d.ratePercent);
		if (d.kind !== 'ad_valorem') {
			c.amount(`tariffRows[${i}].duty.amount`, d.amount);
			c.currency(`tariffRows[${i}].duty.currency`, d.currency);
		}
	});
	checkCharges(ctx, 'brokerage', input.brokerage);
	checkRateCard(ctx, input);
	checkCountry(ctx, input);
}
