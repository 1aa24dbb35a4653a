/**
 * De minimis relief: no duty (or no import VAT/GST) when the shipment's customs value is at most
 * the threshold of the rule in force on the date. Rules carry their own dates, so a suspension
 * (e.g. the US $800 from 29 August 2025, Executive Order 14324) is a rule whose validTo ends.
 */
import type Decimal from 'decimal.js';
import type { Context } from './context';
import { Exact, inForce } from './decimal';
import type { Fx } from './fx';
import type { DeMinimisRule } from './types';

export interface Relief {
	duty: boolean;
	vat: boolean;
	rule: DeMinimisRule | null;
	words: string;
}

export function deMinimis(
	rules: readonly DeMinimisRule[],
	customsValue: Decimal,
	customsCurrency: string,
	fx: Fx,
	ctx: Context
): Relief {
	const rule = rules.find((r) => inForce(r, ctx.date));
	if (rule === undefined) {
		return {
			duty: false,
			vat: false,
			rule: null,
			words: `no de minimis rule in force on ${ctx.date}`
		};
	}
	ctx.used({
		kind: 'de_minimis',
		id: rule.id,
		source: rule.source,
		validFrom: rule.validFrom,
		validTo: rule.validTo
	});
	const factor = fx.quote(rule.currency, customsCurrency)?.factor ?? new Exact(1);
	const within = (limit: string | null) =>
		limit !== null && customsValue.lte(new Exact(limit).times(factor));
	const duty = within(rule.dutyUpTo);
	const vat = within(rule.vatUpTo);
	const words = `customs value ${customsValue.toString()} ${customsCurrency}; duty relief up to ${rule.dutyUpTo ?? 'none'}, VAT relief up to ${rule.vatUpTo ?? 'none'} ${rule.currency}`;
	return { duty, vat, rule, words };
}
