/**
 * The printed content of a paper without its stamp (number, revision, reason, date), as one
 * canonical JSON text: equal texts mean a reissue would print the same paper. Hashing it tells
 * whether an issued paper is still up to date with the shipment.
 *
 * Pure module: no framework imports.
 */
import { LOAD_PLAN_CAUTION } from './build-packing-list';
import type { DocumentSnapshot } from './types';

function canonical(value: unknown): unknown {
	if (Array.isArray(value)) return value.map(canonical);
	if (value && typeof value === 'object') {
		const out: Record<string, unknown> = {};
		for (const key of Object.keys(value).sort()) {
			const v = (value as Record<string, unknown>)[key];
			if (v !== undefined) out[key] = canonical(v);
		}
		return out;
	}
	return value;
}

export function documentContent(snapshot: DocumentSnapshot): string {
	const content: Record<string, unknown> = { ...snapshot };
	for (const stamp of ['number', 'revision', 'revisionReason', 'issuedOn']) delete content[stamp];
	if (snapshot.kind === 'commercial_invoice') {
		const declaration: Record<string, unknown> = { ...snapshot.declaration };
		delete declaration.date;
		content.declaration = declaration;
	}
	// The load-plan summary is filled in when the background planner has finished, which may be
	// just after the issue: its arrival alone must not make an issued paper look out of date.
	if (snapshot.kind === 'packing_list') {
		delete content.loadPlan;
		content.cautions = snapshot.cautions.filter((c) => c !== LOAD_PLAN_CAUTION);
	}
	return JSON.stringify(canonical(content));
}
