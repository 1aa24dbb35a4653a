/**
 * Currency conversion with a stated rate and date. A rate row `1 base = rate quote` serves both
 * directions (the inverse is 1 / rate, exact to 50 digits before rounding). The row must be in
 * force on the calculation date; otherwise the conversion is reported missing or expired, never
 * done at a guessed rate. Results are rounded half-up to the target's ISO 4217 minor unit.
 */
import type Decimal from 'decimal.js';
import { Context, whyNotInForce } from './context';
import { Exact, inForce, money, roundMinor } from './decimal';
import type { ExchangeRate } from './types';

export interface FxQuote {
	/** Multiply an amount in `from` by this to get `to`. */
	factor: Decimal;
	row: ExchangeRate | null;
	words: string;
}

export class Fx {
	private readonly cache = new Map<string, FxQuote | null>();

	constructor(
		private readonly rates: readonly ExchangeRate[],
		private readonly ctx: Context
	) {}

	/** The quote from → to, or null (and a missing entry) when no row is in force. */
	quote(from: string, to: string): FxQuote | null {
		if (from === to) return { factor: new Exact(1), row: null, words: 'same currency' };
		const key = `${from}/${to}`;
		if (this.cache.has(key)) return this.cache.get(key)!;
		const found = this.find(from, to);
		this.cache.set(key, found);
		return found;
	}

	private find(from: string, to: string): FxQuote | null {
		const date = this.ctx.date;
		const pair = this.rates.filter(
			(r) => (r.base === from && r.quote === to) || (r.base === to && r.quote === from)
		);
		const valid = pair
			.filter((r) => inForce(r, date))
			.sort((a, b) => (a.validFrom < b.validFrom ? 1 : -1));
		const row = valid[0];
		if (row === undefined) {
			const latest = [...pair].sort((a, b) => (a.validFrom < b.validFrom ? 1 : -1))[0];
			this.ctx.miss(
				'exchangeRates',
				latest === undefined
					? `no exchange rate ${from} → ${to} for ${date}`
					: `exchange rate ${from} → ${to} (row ${latest.id}) is ${whyNotInForce(latest, date)}; none for ${date}`
			);
			return null;
		}
		this.ctx.used({
			kind: 'exchange_rate',
			id: row.id,
			source: row.source,
			validFrom: row.validFrom,
			validTo: row.validTo
		});
		const rate = new Exact(row.rate);
		const direct = row.base === from;
		const factor = direct ? rate : new Exact(1).dividedBy(rate);
		const words = `1 ${row.base} = ${row.rate} ${row.quote}, rate of ${row.validFrom}${direct ? '' : ' (inverted)'}`;
		return { factor, row, words };
	}

	/**
	 * `amount` in `from` → `to`, rounded to the minor unit, with a trail step when the currencies
	 * differ. Returns zero after recording the missing rate (the engine then fails as a whole).
	 */
	convert(amount: Decimal, from: string, to: string, key: string, label: string): Decimal {
		const q = this.quote(from, to);
		if (q === null) return new Exact(0);
		const out = roundMinor(amount.times(q.factor), to);
		if (q.row !== null) {
			this.ctx.step({
				key: `fx.${key}.${to}`,
				label: `${label} in ${to}`,
				amount: money(out, to),
				currency: to,
				formula: `${money(amount, from)} ${from} × ${q.factor.toSignificantDigits(10).toString()} (${q.words}), half up to the minor unit`,
				inputs: [
					{ label: 'amount', value: `${money(amount, from)} ${from}` },
					{ label: 'rate', value: q.words }
				],
				rowId: q.row.id,
				source: q.row.source
			});
		}
		return out;
	}
}
