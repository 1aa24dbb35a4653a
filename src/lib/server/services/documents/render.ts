/**
 * One issued paper to PDF. The packing list gets the pictures of the cached load plan: one
 * three-dimensional view per container, drawn by the same projection as the shipment page.
 */
import type { DocumentSnapshot } from '../../../documents/types';
import type { ShipmentLoadPlanView } from '../../../load-plan-input';
import { planPicture } from '../../../load-plan-view/plan-view';
import { drawContainer } from '../../../load-plan-view/project';
import { renderInvoicePdf } from '../../documents/pdf/invoice-pdf';
import {
	renderPackingListPdf,
	type LoadPlanPictureForPdf
} from '../../documents/pdf/packing-list-pdf';

export function loadPlanPictures(view: ShipmentLoadPlanView | null): LoadPlanPictureForPdf[] {
	if (!view || view.plan.containers.length === 0) return [];
	const picture = planPicture(view.plan, view.info);
	return view.plan.containers.map((c, i) => {
		const type = view.containerTypes.find((t) => t.id === c.containerTypeId);
		const size = type
			? { lengthMm: type.lengthMm, widthMm: type.widthMm, heightMm: type.heightMm }
			: { lengthMm: 1, widthMm: 1, heightMm: 1 };
		const drawn = picture.containers[i]!;
		return {
			label: `Container ${c.index} of ${view.plan.containers.length}: ${type?.name ?? c.containerTypeId}, ${c.pieces} pieces`,
			drawing: drawContainer(size, drawn.boxes, { kind: 'iso', turn: 0 }),
			legend: drawn.legend
		};
	});
}

export async function renderPaper(
	snapshot: DocumentSnapshot,
	plan: ShipmentLoadPlanView | null
): Promise<{ pdf: Buffer; pages: number }> {
	return snapshot.kind === 'commercial_invoice'
		? renderInvoicePdf(snapshot)
		: renderPackingListPdf(snapshot, loadPlanPictures(plan));
}
