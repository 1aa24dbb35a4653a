import { z } from 'zod';
import { isCountryCode } from '../reference/countries';
import { isPaymentCurrency } from '../reference/currencies';
import { validateHsCode } from '../trade/hs-code';

// Field schemas shared by forms and the API. Decimals stay strings end to end (decimal.js later).

/** A decimal number written with a dot, at most `scale` decimals; `min` 'positive' or 'zero'. */
export function decimalString(label: string, scale: number, min: 'positive' | 'zero' = 'positive') {
	const pattern = new RegExp(`^\\d{1,10}(\\.\\d{1,${scale}})?$`);
	return z
		.string()
		.trim()
		.regex(pattern, `${label}: a number with a dot and at most ${scale} decimals, e.g. 12.5.`)
		.refine((v) => min === 'zero' || /[1-9]/.test(v), `${label} must be more than zero.`);
}

export function optionalDecimalString(label: string, scale: number) {
	return z.union([z.literal(''), decimalString(label, scale)]).optional();
}

export const countryCode = z
	.string()
	.trim()
	.toUpperCase()
	.refine(isCountryCode, 'Choose a country (ISO 3166-1 alpha-2 code such as DE or MY).');

export const currencyCode = z
	.string()
	.trim()
	.toUpperCase()
	.refine(isPaymentCurrency, 'Choose a currency (ISO 4217 code such as USD or EUR).');

export const hsCode = z
	.string()
	.trim()
	.transform((value, ctx) => {
		const result = validateHsCode(value);
		if (!result.ok) {
			ctx.addIssue({ code: 'custom', message: result.message });
			return z.NEVER;
		}
		return result.normalized;
	});

export const positiveInt = (label: string, max = 1_000_000) =>
	z
		.number({ error: `${label}: enter a whole number.` })
		.int(`${label}: enter a whole number.`)
		.min(1, `${label} must be at least 1.`)
		.max(max, `${label} can be at most ${max.toLocaleString('en')}.`);
