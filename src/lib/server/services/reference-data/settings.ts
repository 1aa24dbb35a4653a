import { QueryTypes } from 'sequelize';
import { canEditReferenceData } from '../../../roles';
import {
	brokerageList,
	brokerageRecord,
	type SettingsInput
} from '../../../schemas/landed-cost-settings';
import type { brokerageSchema } from '../../../schemas/landed-cost';
import type { TransportMode } from '../../../trade/shipment-status';
import type { z } from 'zod';
import type { SessionUser } from '../../auth/session-user';
import { Place } from '../../db/models';
import { recordAudit } from '../audit';
import { refused, type ServiceResult } from '../result';
import { bumpVersion } from '../versioned';
import { notAllowed } from './exchange-rates';

// Finance's landed-cost assumptions (the one landed_cost_settings row) and the emission factors
// per mode, which the screens list with their source.

const db = () => Place.sequelize!;

export interface SettingsRow {
	insuranceRatePercent: string;
	insuranceUpliftPercent: string;
	minimumPremium: string | null;
	insuranceSource: string;
	carryingRatePercent: string;
	allocation: 'weight' | 'value';
	brokerage: z.infer<typeof brokerageSchema>;
	version: number;
	updatedAt: string;
}

export async function getSettings(): Promise<SettingsRow | null> {
	const [row] = await db().query<SettingsRow>(
		`SELECT trim_scale(insurance_rate_percent)::text AS "insuranceRatePercent",
		        trim_scale(insurance_uplift_percent)::text AS "insuranceUpliftPercent",
		        trim_scale(minimum_premium)::text AS "minimumPremium", insurance_source AS "insuranceSource",
		        trim_scale(carrying_rate_percent)::text AS "carryingRatePercent", allocation, brokerage,
		        version, updated_at::date::text AS "updatedAt"
		   FROM landed_cost_settings WHERE id = 1`,
		{ type: QueryTypes.SELECT }
	);
	return row ?? null;
}

export function settingsFormValues(row: SettingsRow): SettingsInput {
	return {
		insuranceRatePercent: row.insuranceRatePercent,
		insuranceUpliftPercent: row.insuranceUpliftPercent,
		minimumPremium: row.minimumPremium ?? '',
		insuranceSource: row.insuranceSource,
		carryingRatePercent: row.carryingRatePercent,
		allocation: row.allocation,
		brokerage: brokerageList(row.brokerage),
		version: row.version
	};
}

/** Saves the settings row (it is created by the seed; without it there is nothing to edit). */
export async function saveSettings(
	actor: SessionUser,
	input: SettingsInput,
	ip: string | null
): Promise<ServiceResult<{ version: number }>> {
	if (!canEditReferenceData(actor.role)) return notAllowed();
	const values = {
		rate: input.insuranceRatePercent,
		uplift: input.insuranceUpliftPercent,
		minimum: input.minimumPremium || null,
		source: input.insuranceSource,
		carrying: input.carryingRatePercent,
		allocation: input.allocation,
		brokerage: JSON.stringify(brokerageRecord(input.brokerage))
	};
	return db().transaction(async (transaction) => {
		const before = await getSettings();
		if (!before) return refused(404, 'The landed-cost settings are not set up yet: run the seed.');
		const problem = await bumpVersion(
			'landed_cost_settings',
			1,
			input.version,
			'landed-cost settings',
			transaction
		);
		if (problem) return problem;
		await db().query(
			`UPDATE landed_cost_settings SET insurance_rate_percent = :rate, insurance_uplift_percent = :uplift,
			        minimum_premium = :minimum, insurance_source = :source, carrying_rate_percent = :carrying,
			        allocation = :allocation, brokerage = CAST(:brokerage AS jsonb) WHERE id = 1`,
			{ replacements: values, transaction }
		);
		await recordAudit(
			{
				actorUserId: actor.id,
				action: 'landed_cost_settings.update',
				entity: 'landed_cost_settings',
				entityId: null,
				before: { ...before },
				after: { ...values, brokerage: brokerageRecord(input.brokerage) },
				ip
			},
			transaction
		);
		return { ok: true as const, value: { version: input.version + 1 } };
	});
}

export interface EmissionFactorRow {
	id: string;
	mode: TransportMode;
	gCo2ePerTonneKm: string;
	source: string;
	validFrom: string;
	validTo: string | null;
}

/** Every emission factor, by mode and newest first. */
export async function listEmissionFactors(): Promise<EmissionFactorRow[]> {
	return db().query<EmissionFactorRow>(
		`SELECT id, mode, trim_scale(g_co2e_per_tonne_km)::text AS "gCo2ePerTonneKm", source,
		        valid_from::text AS "validFrom", valid_to::text AS "validTo"
		   FROM emission_factors ORDER BY array_position(ARRAY['air','sea_fcl','sea_lcl','road','courier'], mode), valid_from DESC`,
		{ type: QueryTypes.SELECT }
	);
}
