/**
 * Landed-cost results kept in memory, so asking again for a shipment and mode whose data has not
 * changed costs one small query instead of gathering and computing everything afresh (the
 * comparison page asks per mode on every change of its assumptions).
 *
 * A kept result is valid for its stamp: the shipment's version (moves on every edit of the
 * shipment) and the landed-cost data generation (moves with products, packaging, equipment,
 * places and every reference table: migration 016). The stamp is read before the data, so a
 * result is never filed under a stamp newer than what it was computed from.
 */
import { QueryTypes } from 'sequelize';
import type { SessionUser } from '../../auth/session-user';
import { Shipment } from '../../db/models';
import { shipmentScopeSql } from '../shipment-scope';

/** Enough for every shipment finance is comparing at once; the oldest is dropped first. */
const LIMIT = 200;
const kept = new Map<string, { stamp: string; value: unknown }>();

/** The shipment's stamp, or null when the user may not see it (scoped in the query). */
export async function landedCostStamp(user: SessionUser, shipmentId: string) {
	const scope = shipmentScopeSql(user);
	const rows = await Shipment.sequelize!.query<{ version: number; generation: string }>(
		`SELECT s.version, g.generation FROM shipments s CROSS JOIN landed_cost_data_generation g
		 WHERE s.id = :shipmentId AND ${scope.sql}`,
		{ replacements: { ...scope.replacements, shipmentId }, type: QueryTypes.SELECT }
	);
	const row = rows[0];
	return row ? `${row.version}:${row.generation}` : null;
}

/** The kept value for key when it was computed under this stamp. Callers must not mutate it. */
export function keptResult<T>(key: string, stamp: string): T | undefined {
	const entry = kept.get(key);
	if (!entry || entry.stamp !== stamp) return undefined;
	kept.delete(key); // most recently used goes last
	kept.set(key, entry);
	return entry.value as T;
}

export function keepResult(key: string, stamp: string, value: unknown): void {
	kept.delete(key);
	kept.set(key, { stamp, value });
	while (kept.size > LIMIT) kept.delete(kept.keys().next().value!);
}

/** For tests: forget everything kept. */
export function forgetKeptResults(): void {
	kept.clear();
}
