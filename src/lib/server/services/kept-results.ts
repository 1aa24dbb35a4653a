/**
 * Results about a stored shipment kept in memory, so asking again while its data has not changed
 * costs one small query instead of gathering and computing everything afresh: landed cost per
 * mode (the comparison page asks per mode on every change of its assumptions), the measure, and
 * the load planner's input (every GET of a kept plan needs it for the plan's cache key).
 *
 * A kept result is valid for its stamp: the shipment's version (moves on every edit of the
 * shipment) and the data generation (moves with products, packaging, equipment, places and every
 * landed-cost reference table: migration 016), which covers all that these results read. The
 * stamp is read before the data, so a result is never filed under a stamp newer than what it was
 * computed from.
 */
import { QueryTypes } from 'sequelize';
import type { SessionUser } from '../auth/session-user';
import { Shipment } from '../db/models';
import { shipmentScopeSql } from './shipment-scope';

/** The shipment's stamp, or null when the user may not see it (scoped in the query). */
export async function shipmentStamp(user: SessionUser, shipmentId: string) {
	const scope = shipmentScopeSql(user);
	const rows = await Shipment.sequelize!.query<{ version: number; generation: string }>(
		`SELECT s.version, g.generation FROM shipments s CROSS JOIN landed_cost_data_generation g
		 WHERE s.id = :shipmentId AND ${scope.sql}`,
		{ replacements: { ...scope.replacements, shipmentId }, type: QueryTypes.SELECT }
	);
	const row = rows[0];
	return row ? `${row.version}:${row.generation}` : null;
}

/** One kind of kept result, at most `limit` of them; the least recently used is dropped first. */
export class KeptResults<T> {
	readonly #kept = new Map<string, { stamp: string; value: T }>();

	constructor(readonly limit: number) {}

	/** The kept value for key when it was computed under this stamp. Callers must not mutate it. */
	get(key: string, stamp: string): T | undefined {
		const entry = this.#kept.get(key);
		if (!entry || entry.stamp !== stamp) return undefined;
		this.#kept.delete(key); // most recently used goes last
		this.#kept.set(key, entry);
		return entry.value;
	}

	keep(key: string, stamp: string, value: T): void {
		this.#kept.delete(key);
		this.#kept.set(key, { stamp, value });
		while (this.#kept.size > this.limit) this.#kept.delete(this.#kept.keys().next().value!);
	}

	/** For tests: forget everything kept. */
	clear(): void {
		this.#kept.clear();
	}
}
