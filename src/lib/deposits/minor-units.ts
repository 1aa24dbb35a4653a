/**
 * Deposit amounts in ISO 4217 minor units (JPY 0 decimals, EUR 2, KWD 3), as Stripe takes them:
 * whole numbers held as bigint, never JS floats. Exact decimals through decimal.js.
 *
 * Pure module: no framework imports.
 */
import Decimal from 'decimal.js';
import { minorUnits } from '../reference/currencies';

const Exact = Decimal.clone({ precision: 60, rounding: Decimal.ROUND_HALF_UP });

/** Minor-unit digits of a payment currency; throws for a code without one (XAU, XXX, unknown). */
export function currencyDigits(currency: string): number {
	const digits = minorUnits(currency);
	if (digits === undefined) throw new RangeError(`${currency} has no ISO 4217 minor unit`);
	return digits;
}

export type MinorResult = { ok: true; minor: bigint } | { ok: false; message: string };

/**
 * A typed amount ('1250.50') in minor units (125050n for EUR). Refuses more decimals than the
 * currency has (JPY '10.5'), zero and negative amounts: a deposit is never rounded silently.
 */
export function toMinor(amount: string, currency: string): MinorResult {
	const digits = currencyDigits(currency);
	const text = amount.trim();
	if (!/^\d{1,15}(\.\d+)?$/.test(text))
		return { ok: false, message: 'Enter an amount with a dot for decimals, e.g. 1250.00.' };
	const decimals = text.split('.')[1]?.length ?? 0;
	if (decimals > digits)
		return {
			ok: false,
			message:
				digits === 0
					? `${currency} has no decimals (ISO 4217): enter a whole amount.`
					: `${currency} has ${digits} decimals (ISO 4217): enter at most ${digits}.`
		};
	const minor = BigInt(new Exact(text).times(new Exact(10).pow(digits)).toFixed(0));
	if (minor <= 0n) return { ok: false, message: 'The amount must be more than zero.' };
	return { ok: true, minor };
}

/** Minor units back to a decimal string with exactly the currency's decimals (125050n → '1250.50'). */
export function fromMinor(minor: bigint | string | number, currency: string): string {
	const digits = currencyDigits(currency);
	const value = BigInt(minor);
	const sign = value < 0n ? '-' : '';
	const abs = (value < 0n ? -value : value).toString().padStart(digits + 1, '0');
	if (digits === 0) return sign + abs;
	return `${sign}${abs.slice(0, -digits)}.${abs.slice(-digits)}`;
}

/**
 * `percent` % of a decimal `estimate`, rounded half-up to the currency's minor unit (common
 * practice for money), in minor units. 30 % of 1234.565 EUR → 37037n (370.37).
 */
export function percentOfMinor(estimate: string, percent: string, currency: string): bigint {
	const digits = currencyDigits(currency);
	const exact = new Exact(estimate).times(percent).dividedBy(100);
	return BigInt(exact.times(new Exact(10).pow(digits)).toFixed(0, Decimal.ROUND_HALF_UP));
}

/** Money for the screens: the currency code and its amount with thousands separators. */
export function formatMinor(minor: bigint | string | number, currency: string): string {
	const [whole, fraction] = fromMinor(minor, currency).split('.');
	const grouped = whole!.replace(/\B(?=(\d{3})+(?!\d))/g, ',');
	return `${currency} ${fraction === undefined ? grouped : `${grouped}.${fraction}`}`;
}
