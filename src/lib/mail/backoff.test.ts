import { describe, expect, it } from 'vitest';
import { DEFAULT_BACKOFF, retryDelayMs } from './backoff';

// The schedule is exponential with a cap (common practice; AWS Architecture Blog,
// "Exponential Backoff And Jitter", 2015): base · 2^(n−1), capped, then give up.
describe('retryDelayMs', () => {
	it('doubles from the base: 30 s, 60 s, 120 s, 240 s', () => {
		expect([1, 2, 3, 4].map((n) => retryDelayMs(n))).toEqual([30_000, 60_000, 120_000, 240_000]);
	});

	it('stops at the cap (one hour)', () => {
		expect(retryDelayMs(8)).toBe(60 * 60_000); // 30 s · 2^7 = 64 min > 60 min
		expect(retryDelayMs(11)).toBe(60 * 60_000);
	});

	it('gives up after maxAttempts failures', () => {
		expect(retryDelayMs(DEFAULT_BACKOFF.maxAttempts)).toBeNull();
		expect(retryDelayMs(3, { baseMs: 100, capMs: 1000, maxAttempts: 3 })).toBeNull();
		expect(retryDelayMs(2, { baseMs: 100, capMs: 1000, maxAttempts: 3 })).toBe(200);
	});

	it('refuses attempt numbers below 1', () => {
		expect(() => retryDelayMs(0)).toThrow(RangeError);
	});
});
