/**
 * Import VAT/GST. Each line's base (customs value plus what the country adds: duty, fees,
 * transport to the destination...) goes into the group of its rate (a reduced rate by the
 * longest HS prefix, else the standard rate). Per group, the base and then the tax are rounded
 * by the country's rules (default half-up to the minor unit), as a declaration assesses per rate.
 */
import type Decimal from 'decimal.js';
import { Exact, ZERO, percent, roundMinor, roundToRule, ruleWords } from './decimal';
import type { CountryRules } from './types';

export interface VatGroup {
	ratePercent: string;
	base: Decimal;
	roundedBase: Decimal;
	vat: Decimal;
	formula: string;
}

export interface VatResult {
	total: Decimal;
	groups: VatGroup[];
	/** Per line: its base × rate (exact), the weights for sharing the total out. */
	lineWeights: Decimal[];
}

export function vatRate(rules: CountryRules, hsCode: string): string {
	let best: { hsPrefix: string; ratePercent: string } | undefined;
	for (const r of rules.vat.reduced) {
		if (hsCode.startsWith(r.hsPrefix) && r.hsPrefix.length > (best?.hsPrefix.length ?? 0)) best = r;
	}
	return best?.ratePercent ?? rules.vat.ratePercent;
}

export function importVat(
	rules: CountryRules,
	bases: readonly Decimal[],
	hsCodes: readonly string[]
): VatResult {
	const byRate = new Map<string, Decimal>();
	const rates = hsCodes.map((hs) => vatRate(rules, hs));
	bases.forEach((b, i) => byRate.set(rates[i]!, (byRate.get(rates[i]!) ?? ZERO).plus(b)));
	const groups: VatGroup[] = [];
	let total = new Exact(0);
	for (const [ratePercent, base] of byRate) {
		const { vatBase, vat } = rules.rounding;
		const roundedBase = vatBase ? roundToRule(base, vatBase) : base;
		const raw = roundedBase.times(percent(ratePercent));
		const amount = vat ? roundToRule(raw, vat) : roundMinor(raw, rules.currency);
		const baseWords = vatBase ? ` (base ${ruleWords(vatBase)})` : '';
		const vatWords = vat ? ruleWords(vat) : 'half up to the minor unit';
		groups.push({
			ratePercent,
			base,
			roundedBase,
			vat: amount,
			formula: `${ratePercent} % × ${roundedBase.toString()}${baseWords}, ${vatWords}`
		});
		total = total.plus(amount);
	}
	const lineWeights = bases.map((b, i) => b.times(percent(rates[i]!)));
	return { total, groups, lineWeights };
}
