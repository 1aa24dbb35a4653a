/**
 * The working state of one calculation (internal): what is missing, the trail of figures and
 * the reference rows used. Steps add to it as they go; the engine returns a failure listing
 * everything missing rather than a figure computed with a zero.
 */
import type { DataUsed, Missing, TrailStep } from './types';

export class Context {
	readonly missing: Missing[] = [];
	readonly trail: TrailStep[] = [];
	readonly data: DataUsed[] = [];
	private readonly seen = new Set<string>();

	constructor(readonly date: string) {}

	/** Records a problem once per path and message. */
	miss(path: string, message: string): void {
		const key = `${path}\u0000${message}`;
		if (this.seen.has(key)) return;
		this.seen.add(key);
		this.missing.push({ path, message });
	}

	step(step: TrailStep): void {
		this.trail.push(step);
	}

	/** Records a reference row once. */
	used(entry: DataUsed): void {
		const key = `${entry.kind}\u0000${entry.id}`;
		if (this.seen.has(key)) return;
		this.seen.add(key);
		this.data.push(entry);
	}

	get failed(): boolean {
		return this.missing.length > 0;
	}
}

/** "expired on 2025-09-30" or "not valid until 2026-10-01", for a row not in force on `date`. */
export function whyNotInForce(row: { validFrom: string; validTo: string | null }, date: string) {
	return date < row.validFrom
		? `not valid until ${row.validFrom}`
		: `expired on ${row.validTo ?? '?'}`;
}
