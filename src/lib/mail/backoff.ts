/**
 * When the outbox tries a message again after a failed send: exponential backoff with a cap,
 * then it gives up. Pure module: no framework imports.
 *
 * Attempt n (1-based, the one that just failed) waits base · 2^(n-1), at most `capMs`: with the
 * defaults 30 s, 1 min, 2 min, 4 min, … 1 h, 1 h. After `maxAttempts` failures the row is
 * `failed`. (Exponential backoff with a cap: common practice, e.g. AWS Architecture Blog,
 * "Exponential Backoff And Jitter", 2015; no jitter here because one dispatcher per process
 * polls at a fixed interval anyway.)
 */
export interface BackoffPolicy {
	baseMs: number;
	capMs: number;
	maxAttempts: number;
}

export const DEFAULT_BACKOFF: BackoffPolicy = {
	baseMs: 30_000,
	capMs: 60 * 60_000,
	maxAttempts: 12
};

/** Milliseconds to wait after the `attempts`-th failure, or null when the message has failed for good. */
export function retryDelayMs(
	attempts: number,
	policy: BackoffPolicy = DEFAULT_BACKOFF
): number | null {
	if (!Number.isInteger(attempts) || attempts < 1) throw new RangeError('attempts starts at 1');
	if (attempts >= policy.maxAttempts) return null;
	// 2^(n-1) grows past the cap quickly; stop doubling early so the number stays small.
	const doublings = Math.min(attempts - 1, 40);
	return Math.min(policy.baseMs * 2 ** doublings, policy.capMs);
}
