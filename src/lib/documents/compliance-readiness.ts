/**
 * The compliance part of the check before papers are issued: lithium-battery test summaries and
 * a claim of preferential origin. Blocking items stop the issue; advice is shown beside them.
 *
 * Pure module: no framework imports.
 */
import type { DocumentSource } from './source';

export type ComplianceArea = 'papers' | 'documents' | 'product';

export interface ComplianceItem {
	area: ComplianceArea;
	field: string;
	message: string;
	sku?: string;
}

/** Modes that fly: the goods go by air, as cargo or as express courier parcels. */
const AIR_MODES = new Set(['air', 'courier']);

const blank = (v: string | null | undefined) => v === null || v === undefined || v.trim() === '';

/**
 * Lithium cells and batteries of every kind must have passed the UN38.3 tests, and since
 * 1 January 2020 whoever offers them for transport must be able to make the test summary
 * available (UN Model Regulations, 21st rev. ed. 2019, 2.9.4 (g); UN Manual of Tests and
 * Criteria, 38.3.5; from memory). Airlines and forwarders ask for it before they accept the
 * goods (common practice), so by air a missing summary blocks the papers; by sea and road it is
 * advice.
 */
function lithiumItems(source: DocumentSource): {
	blocking: ComplianceItem[];
	advice: ComplianceItem[];
} {
	const blocking: ComplianceItem[] = [];
	const advice: ComplianceItem[] = [];
	const byAir = source.chosenMode !== null && AIR_MODES.has(source.chosenMode);
	const seen = new Set<string>();
	for (const line of source.lines) {
		if (line.battery === 'none' || seen.has(line.sku) || line.un383OnFile) continue;
		seen.add(line.sku);
		const kind = line.batteryChemistry === 'lithium_metal' ? 'lithium-metal' : 'lithium-ion';
		const item = {
			area: 'product' as const,
			field: 'un383Summary',
			sku: line.sku,
			message: byAir
				? `${line.sku}: ${kind} batteries going by air need a current UN38.3 test summary on file.`
				: `${line.sku}: no current UN38.3 test summary on file for its ${kind} batteries; the carrier may ask for it.`
		};
		(byAir ? blocking : advice).push(item);
	}
	return { blocking, advice };
}

function originItems(source: DocumentSource): ComplianceItem[] {
	const d = source.details;
	if (!d.preferentialOriginClaimed) return [];
	const items: ComplianceItem[] = [];
	if (blank(d.preferentialAgreement))
		items.push({
			area: 'papers',
			field: 'preferentialAgreement',
			message: 'Preferential origin is claimed: name the trade agreement.'
		});
	if (blank(d.originStatement))
		items.push({
			area: 'papers',
			field: 'originStatement',
			message: 'Preferential origin is claimed: write the statement on origin.'
		});
	if (!source.proofOfOriginOnFile)
		items.push({
			area: 'documents',
			field: 'proofOfOrigin',
			message:
				'Preferential origin is claimed: put a current proof of origin (certificate or supplier declaration) on file.'
		});
	return items;
}

/** What blocks the issue for compliance reasons; empty when nothing does. */
export function complianceBlocking(source: DocumentSource): ComplianceItem[] {
	return [...originItems(source), ...lithiumItems(source).blocking];
}

/** What is worth checking before the issue but does not stop it. */
export function complianceAdvice(source: DocumentSource): ComplianceItem[] {
	return lithiumItems(source).advice;
}
