/**
 * Issuing and reissuing the customs papers of a shipment.
 *
 * Numbers come from document_counters in the issuing transaction (gap-free, see migration 011);
 * the snapshot, the PDF made from it and its SHA-256 are stored together. A reissue keeps the
 * number, takes the next revision letter, needs a reason, and marks the previous one superseded.
 * Issuing a booked shipment's papers moves it to "documents issued".
 */
import { createHash } from 'node:crypto';
import { QueryTypes, type Transaction } from 'sequelize';
import { buildInvoice } from '../../../documents/build-invoice';
import { buildPackingList } from '../../../documents/build-packing-list';
import { documentContent } from '../../../documents/content';
import { documentNumber, revisionLetter } from '../../../documents/money';
import { readiness, type ReadinessItem } from '../../../documents/readiness';
import type { DocumentSource, IssueStamp } from '../../../documents/source';
import {
	DOCUMENT_KINDS,
	DOCUMENT_TITLES,
	type DocumentKind,
	type DocumentSnapshot
} from '../../../documents/types';
import type { SessionUser } from '../../auth/session-user';
import { Shipment, ShipmentStatusEvent } from '../../db/models';
import { recordAudit } from '../audit';
import { papersIssued } from '../shipment-notices';
import { refused, type Refusal, type ServiceResult } from '../result';
import { canEditShipments } from '../shipment-scope';
import { documentSource, type GatheredSource } from './document-source';
import { renderPaper } from './render';

export const NUMBER_PREFIX: Readonly<Record<DocumentKind, string>> = Object.freeze({
	commercial_invoice: 'CI',
	packing_list: 'PL'
});

class Refused extends Error {
	constructor(readonly result: Refusal) {
		super(result.message);
	}
}

export function sha256(data: string | Buffer): string {
	return createHash('sha256').update(data).digest('hex');
}

export function buildSnapshot(
	kind: DocumentKind,
	source: DocumentSource,
	stamp: IssueStamp
): DocumentSnapshot {
	return kind === 'commercial_invoice'
		? buildInvoice(source, stamp)
		: buildPackingList(source, stamp);
}

/** The content hash a paper of `kind` would have if it were issued from `source` now. */
export function freshContentHash(kind: DocumentKind, source: DocumentSource): string {
	const stamp = { number: '', revision: 'A', revisionReason: null, issuedOn: '' };
	return sha256(documentContent(buildSnapshot(kind, source, stamp)));
}

/** The readiness items as field errors (first message per field), for forms and the API. */
export function readinessErrors(items: readonly ReadinessItem[]): Record<string, string> {
	const errors: Record<string, string> = {};
	for (const item of items) {
		const key = item.sku ? `products.${item.sku}.${item.field}` : item.field;
		errors[key] ??= item.message;
	}
	return errors;
}

interface CurrentRow {
	id: string;
	kind: DocumentKind;
	year: number;
	sequence: number;
	number: string;
	revision_index: number;
}

async function nextSequence(
	t: Transaction,
	exporterId: string,
	kind: DocumentKind,
	year: number
): Promise<number> {
	const [row] = await Shipment.sequelize!.query<{ last_sequence: number }>(
		`INSERT INTO document_counters (exporter_id, kind, year, last_sequence) VALUES (:exporterId, :kind, :year, 1)
		 ON CONFLICT (exporter_id, kind, year) DO UPDATE SET last_sequence = document_counters.last_sequence + 1
		 RETURNING last_sequence`,
		{ replacements: { exporterId, kind, year }, transaction: t, type: QueryTypes.SELECT }
	);
	return row!.last_sequence;
}

export interface IssuedPaper {
	id: string;
	kind: DocumentKind;
	number: string;
	revision: string;
	sha256: string;
	pages: number;
}

async function issueOne(
	t: Transaction,
	actor: SessionUser,
	g: GatheredSource,
	kind: DocumentKind,
	current: CurrentRow | undefined,
	reason: string | null,
	now: Date
): Promise<IssuedPaper> {
	const year = current ? current.year : now.getUTCFullYear();
	const sequence = current ? current.sequence : await nextSequence(t, g.exporterId, kind, year);
	const revisionIndex = current ? current.revision_index + 1 : 0;
	const stamp: IssueStamp = {
		number: current ? current.number : documentNumber(NUMBER_PREFIX[kind], year, sequence),
		revision: revisionLetter(revisionIndex),
		revisionReason: current ? reason : null,
		issuedOn: now.toISOString().slice(0, 10)
	};
	const snapshot = buildSnapshot(kind, g.source, stamp);
	const { pdf, pages } = await renderPaper(snapshot, g.loadPlan);
	// Out of the "one current paper per kind" index first; linked to its successor below.
	if (current)
		await Shipment.sequelize!.query(
			'UPDATE shipment_documents SET superseded_at = :now WHERE id = :id',
			{ replacements: { now, id: current.id }, transaction: t }
		);
	const digest = sha256(pdf);
	const [inserted] = await Shipment.sequelize!.query<{ id: string }>(
		`INSERT INTO shipment_documents (shipment_id, exporter_id, kind, year, sequence, number, revision_index,
		        revision, reason, shipment_version, content_hash, snapshot, pdf, sha256, byte_size, pages, issued_by, issued_at)
		 VALUES (:shipmentId, :exporterId, :kind, :year, :sequence, :number, :revisionIndex, :revision, :reason,
		        :version, :contentHash, :snapshot::jsonb, :pdf, :sha256, :size, :pages, :actor, :now)
		 RETURNING id`,
		{
			replacements: {
				shipmentId: g.shipmentId,
				exporterId: g.exporterId,
				kind,
				year,
				sequence,
				number: stamp.number,
				revisionIndex,
				revision: stamp.revision,
				reason: stamp.revisionReason,
				version: g.version,
				contentHash: sha256(documentContent(snapshot)),
				snapshot: JSON.stringify(snapshot),
				pdf,
				sha256: digest,
				size: pdf.length,
				pages,
				actor: actor.id,
				now
			},
			transaction: t,
			type: QueryTypes.SELECT
		}
	);
	if (current) {
		await Shipment.sequelize!.query(
			'UPDATE shipment_documents SET superseded_by = :next WHERE id = :id',
			{ replacements: { next: inserted!.id, id: current.id }, transaction: t }
		);
	}
	return {
		id: inserted!.id,
		kind,
		number: stamp.number,
		revision: stamp.revision,
		sha256: digest,
		pages
	};
}

export interface IssueRequest {
	kinds: DocumentKind[];
	/** Required when any of `kinds` is already issued (then this is a reissue). */
	reason: string;
}

/**
 * Issues the papers of `kinds` that are not yet issued, and reissues (as the next revision, with
 * `reason`) those that are. All or nothing.
 */
export async function issuePapers(
	actor: SessionUser,
	shipmentId: string,
	request: IssueRequest,
	ip: string | null
): Promise<ServiceResult<{ papers: IssuedPaper[]; status: string }>> {
	if (!canEditShipments(actor))
		return refused(403, 'Only coordinators and administrators issue papers.');
	const g = await documentSource(actor, shipmentId);
	if (!g) return refused(404, 'No shipment with this id is visible to you.');
	const items = readiness(g.source);
	if (items.length > 0)
		return refused(
			400,
			`The papers cannot be issued yet: ${items.length} ${items.length === 1 ? 'thing is' : 'things are'} missing.`,
			readinessErrors(items)
		);
	const kinds = [...new Set(request.kinds)];
	const reason = request.reason.trim();
	try {
		const value = await Shipment.sequelize!.transaction(async (t) => {
			const shipment = await Shipment.findByPk(shipmentId, {
				transaction: t,
				lock: t.LOCK.UPDATE
			});
			if (!shipment || shipment.version !== g.version)
				throw new Refused(
					refused(409, 'The shipment changed while the papers were being made. Try again.')
				);
			const current = await Shipment.sequelize!.query<CurrentRow>(
				`SELECT id, kind, year, sequence, number, revision_index FROM shipment_documents
				  WHERE shipment_id = :shipmentId AND superseded_at IS NULL`,
				{ replacements: { shipmentId }, transaction: t, type: QueryTypes.SELECT }
			);
			const byKind = new Map(current.map((c) => [c.kind, c]));
			if (kinds.some((k) => byKind.has(k)) && reason.length < 5)
				throw new Refused(
					refused(400, 'A reissue needs a reason.', {
						reason: 'Say why the paper is issued again (at least 5 characters).'
					})
				);
			const now = new Date();
			const papers: IssuedPaper[] = [];
			for (const kind of kinds)
				papers.push(await issueOne(t, actor, g, kind, byKind.get(kind), reason || null, now));
			let status: string = shipment.status;
			if (shipment.status === 'booked') {
				status = 'documents_issued';
				await Shipment.sequelize!.query(
					`UPDATE shipments SET status = 'documents_issued', version = version + 1, updated_at = now() WHERE id = :shipmentId`,
					{ replacements: { shipmentId }, transaction: t }
				);
				await ShipmentStatusEvent.create(
					{
						shipmentId,
						fromStatus: 'booked',
						toStatus: 'documents_issued',
						actorUserId: actor.id,
						note: `Issued ${papers.map((p) => `${p.number} rev. ${p.revision}`).join(', ')}`
					},
					{ transaction: t }
				);
			}
			await recordAudit(
				{
					actorUserId: actor.id,
					action: papers.some((p) => p.revision !== 'A') ? 'documents.reissue' : 'documents.issue',
					entity: 'shipment',
					entityId: shipmentId,
					after: {
						papers: papers.map(({ number, revision, sha256 }) => ({ number, revision, sha256 })),
						reason: reason || null
					},
					ip
				},
				t
			);
			await papersIssued(t, shipmentId, papers);
			return { papers, status };
		});
		return { ok: true, value };
	} catch (error) {
		if (error instanceof Refused) return error.result;
		throw error;
	}
}

/** Why the shipment's papers do not stand for it as it is now, or null when they do. */
export async function papersOutOfDate(
	user: SessionUser,
	shipmentId: string
): Promise<string | null> {
	const g = await documentSource(user, shipmentId);
	if (!g) return null;
	const current = await Shipment.sequelize!.query<{ kind: DocumentKind; content_hash: string }>(
		`SELECT kind, content_hash FROM shipment_documents WHERE shipment_id = :shipmentId AND superseded_at IS NULL`,
		{ replacements: { shipmentId }, type: QueryTypes.SELECT }
	);
	const byKind = new Map(current.map((c) => [c.kind, c.content_hash]));
	const missing = DOCUMENT_KINDS.filter((k) => !byKind.has(k));
	if (missing.length)
		return `Issue the ${missing.map((k) => DOCUMENT_TITLES[k].toLowerCase()).join(' and the ')} first, from the papers panel.`;
	if (readiness(g.source).length > 0)
		return 'The shipment is missing data its papers need; see the papers panel.';
	const stale = DOCUMENT_KINDS.filter((k) => freshContentHash(k, g.source) !== byKind.get(k));
	if (stale.length)
		return `The shipment changed since the ${stale.map((k) => DOCUMENT_TITLES[k].toLowerCase()).join(' and the ')} ${stale.length === 1 ? 'was' : 'were'} issued: reissue with a reason.`;
	return null;
}
