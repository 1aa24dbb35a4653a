/**
 * Saved landed-cost scenarios: the engine inputs of the chosen modes, with every reference row
 * they used, and their results, frozen under a name. Later changes to rates or tariffs leave a
 * scenario as it was; recomputing it from its own inputs gives the same figures.
 */
import { QueryTypes } from 'sequelize';
import { isStaff } from '../../../roles';
import type { LandedCostInput, LandedCostOk, TransportMode } from '../../../landed-cost/types';
import type { SessionUser } from '../../auth/session-user';
import { Shipment } from '../../db/models';
import { recordAudit } from '../audit';
import { refused, type ServiceResult } from '../result';
import { shipmentScopeSql } from '../shipment-scope';
import { shipmentLandedCost } from './compute';
import type { InputOptions } from './input';

export interface ScenarioSummary {
	id: string;
	name: string;
	createdAt: string;
	createdBy: string | null;
	totals: { mode: TransportMode; total: string; currency: string }[];
}

export interface Scenario extends ScenarioSummary {
	inputs: Partial<Record<TransportMode, LandedCostInput>>;
	results: Partial<Record<TransportMode, LandedCostOk>>;
}

async function visible(user: SessionUser, shipmentId: string): Promise<boolean> {
	const scope = shipmentScopeSql(user);
	const rows = await Shipment.sequelize!.query(
		`SELECT 1 FROM shipments s WHERE s.id = :shipmentId AND ${scope.sql}`,
		{ replacements: { shipmentId, ...scope.replacements }, type: QueryTypes.SELECT }
	);
	return rows.length === 1;
}

export async function saveScenario(
	user: SessionUser,
	shipmentId: string,
	request: { name: string; modes: TransportMode[]; options: InputOptions },
	ip: string | null
): Promise<ServiceResult<{ id: string; modes: TransportMode[]; skipped: string[] }>> {
	if (!isStaff(user.role)) return refused(403, 'Only staff save landed-cost scenarios.');
	if (!(await visible(user, shipmentId)))
		return refused(404, 'No shipment with this id is visible to you.');
	const inputs: Partial<Record<TransportMode, LandedCostInput>> = {};
	const results: Partial<Record<TransportMode, LandedCostOk>> = {};
	const skipped: string[] = [];
	for (const mode of [...new Set(request.modes)]) {
		const outcome = await shipmentLandedCost(user, shipmentId, mode, request.options);
		if (outcome.ok && outcome.result.ok) {
			inputs[mode] = outcome.input;
			results[mode] = outcome.result;
		} else skipped.push(mode);
	}
	const saved = Object.keys(results) as TransportMode[];
	if (saved.length === 0)
		return refused(409, 'No mode could be computed, so there is nothing to save.', {
			name: 'No mode could be computed with the data on record.'
		});
	const [row] = await Shipment.sequelize!.query<{ id: string }>(
		`INSERT INTO landed_cost_scenarios (shipment_id, name, inputs, results, created_by)
		 VALUES (:shipmentId, :name, :inputs::jsonb, :results::jsonb, :userId) RETURNING id`,
		{
			replacements: {
				shipmentId,
				name: request.name,
				inputs: JSON.stringify(inputs),
				results: JSON.stringify(results),
				userId: user.id
			},
			type: QueryTypes.SELECT
		}
	);
	await recordAudit({
		actorUserId: user.id,
		action: 'landed_cost.scenario_save',
		entity: 'shipment',
		entityId: shipmentId,
		after: { scenarioId: row!.id, name: request.name, modes: saved },
		ip
	});
	return { ok: true, value: { id: row!.id, modes: saved, skipped } };
}

interface Row {
	id: string;
	name: string;
	created_at: Date;
	created_by: string | null;
	results: Partial<Record<TransportMode, LandedCostOk>>;
	inputs?: Partial<Record<TransportMode, LandedCostInput>>;
}

function summary(r: Row): ScenarioSummary {
	return {
		id: r.id,
		name: r.name,
		createdAt: r.created_at.toISOString(),
		createdBy: r.created_by,
		totals: Object.values(r.results).map((x) => ({
			mode: x!.mode,
			total: x!.total.amount,
			currency: x!.total.currency
		}))
	};
}

export async function listScenarios(
	user: SessionUser,
	shipmentId: string
): Promise<ScenarioSummary[]> {
	if (!isStaff(user.role) || !(await visible(user, shipmentId))) return [];
	const rows = await Shipment.sequelize!.query<Row>(
		`SELECT c.id, c.name, c.created_at, u.name AS created_by, c.results
		   FROM landed_cost_scenarios c LEFT JOIN users u ON u.id = c.created_by
		  WHERE c.shipment_id = :shipmentId ORDER BY c.created_at DESC`,
		{ replacements: { shipmentId }, type: QueryTypes.SELECT }
	);
	return rows.map(summary);
}

export async function getScenario(
	user: SessionUser,
	shipmentId: string,
	scenarioId: string
): Promise<Scenario | null> {
	if (!isStaff(user.role) || !(await visible(user, shipmentId))) return null;
	const [row] = await Shipment.sequelize!.query<Row>(
		`SELECT c.id, c.name, c.created_at, u.name AS created_by, c.results, c.inputs
		   FROM landed_cost_scenarios c LEFT JOIN users u ON u.id = c.created_by
		  WHERE c.shipment_id = :shipmentId AND c.id = :scenarioId`,
		{ replacements: { shipmentId, scenarioId }, type: QueryTypes.SELECT }
	);
	return row ? { ...summary(row), inputs: row.inputs ?? {}, results: row.results } : null;
}
