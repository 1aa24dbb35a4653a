import { error, fail, redirect, type RequestEvent } from '@sveltejs/kit';
import { message, superValidate } from 'sveltekit-superforms';
import { zod4 } from 'sveltekit-superforms/adapters';
import { requireRole, requireUser } from '$lib/server/auth/guard';
import { readForm, refuse, validateForm } from '$lib/server/forms';
import { NUL_MESSAGE, nulPaths } from '$lib/schemas/nul-text';
import {
	retireSupportingAction,
	supportingDocumentsData,
	uploadSupportingAction
} from '$lib/server/supporting-document-actions';
import { countryAndCurrencyOptions } from '$lib/server/services/form-options';
import {
	DEPOSIT_REQUESTERS,
	cancelDeposit,
	listDeposits,
	refundDeposit,
	requestDeposit,
	startCheckout
} from '$lib/server/services/deposits';
import { issuePapers } from '$lib/server/services/documents/issue';
import { documentRegister } from '$lib/server/services/documents/register';
import { cachedLoadPlan } from '$lib/server/services/load-plan';
import { addLot, addLots, listLots, removeLot } from '$lib/server/services/shipment-lots';
import { measureShipment } from '$lib/server/services/shipment-measure';
import type { ServiceResult } from '$lib/server/services/result';
import { shipmentFormOptions } from '$lib/server/services/shipment-options';
import { canEditShipments } from '$lib/server/services/shipment-scope';
import {
	EDITABLE_STATUSES,
	addContainer,
	changeStatus,
	removeContainer,
	replaceLines,
	updatePaperDetails,
	updateShipment
} from '$lib/server/services/shipments';
import { depositActionSchema, depositRequestSchema } from '$lib/schemas/deposits';
import { issuePapersSchema, paperDetailsSchema } from '$lib/schemas/documents';
import {
	containerSchema,
	lotImportSchema,
	lotSchema,
	shipmentLinesSchema,
	shipmentSchema,
	statusChangeSchema
} from '$lib/schemas/shipments';
import { DOCUMENT_KINDS } from '$lib/documents/types';
import { isStaff } from '$lib/roles';
import { shipmentLithiumView } from '$lib/lithium-view';
import { productsBySku } from '$lib/server/services/products';
import { INCOTERM_OBLIGATIONS_SOURCE, incotermObligations } from '$lib/trade/incoterm-obligations';
import { incotermChecks } from '$lib/trade/incoterm-checks';
import { isIncoterm } from '$lib/trade/incoterms';
import { responsibilityMatrix } from '$lib/trade/responsibility-matrix';
import { allowedTransitions } from '$lib/trade/shipment-status';
import type { Actions, PageServerLoad } from './$types';

// Returns: shipment (header, lines, containers, status history), measure (packing result),
// canEdit/editable, transitions, options, and the header/lines/container forms.
export const load: PageServerLoad = async (event) => {
	const user = requireUser(event);
	const measured = await measureShipment(user, event.params.shipmentId);
	if (!measured) error(404, { message: 'No shipment with this id is visible to you.' });
	const { shipment, result } = measured;
	const canEdit = canEditShipments(user);
	const editable = canEdit && EDITABLE_STATUSES.includes(shipment.status);
	const named = [
		shipment.originId,
		shipment.destinationId,
		shipment.consigneeId,
		shipment.notifyPartyId
	];
	const options = canEdit ? await shipmentFormOptions(named) : null;
	const header = {
		customerId: shipment.customerId,
		consigneeId: shipment.consigneeId ?? '',
		notifyPartyId: shipment.notifyPartyId ?? '',
		brokerId: shipment.brokerId ?? '',
		incoterm: shipment.incoterm as 'FCA',
		incotermPlace: shipment.incotermPlace,
		originId: shipment.originId,
		destinationId: shipment.destinationId,
		modesConsidered: shipment.modesConsidered,
		chosenMode: shipment.chosenMode ?? ('' as const),
		currency: shipment.currency,
		palletTypeId: shipment.palletTypeId ?? '',
		carrier: shipment.carrier ?? '',
		vessel: shipment.vessel ?? '',
		voyageOrFlight: shipment.voyageOrFlight ?? '',
		bookingNumber: shipment.bookingNumber ?? '',
		etd: shipment.etd ?? '',
		eta: shipment.eta ?? '',
		notes: shipment.notes ?? '',
		version: shipment.version
	};
	const lines = shipment.lines.map((l) => ({
		productId: l.productId,
		quantity: l.quantity,
		unitPrice: l.unitPrice
	}));
	const paperDetails = {
		paymentTerms: shipment.paymentTerms ?? '',
		exportReason: shipment.exportReason ?? '',
		freightAmount: shipment.freightAmount ?? '',
		insuranceAmount: shipment.insuranceAmount ?? '',
		marks: shipment.marks ?? '',
		signatoryName: shipment.signatoryName ?? '',
		signatoryTitle: shipment.signatoryTitle ?? '',
		signingPlace: shipment.signingPlace ?? '',
		preferentialOriginClaimed: shipment.preferentialOriginClaimed,
		preferentialAgreement: shipment.preferentialAgreement ?? '',
		originStatement: shipment.originStatement ?? '',
		version: shipment.version
	};
	const [
		headerForm,
		linesForm,
		containerForm,
		lotForm,
		lotImportForm,
		lots,
		loadPlan,
		papers,
		paperForm,
		issueForm,
		deposits,
		depositForm,
		supporting,
		lineProducts
	] = await Promise.all([
		superValidate(header, zod4(shipmentSchema), { errors: false, id: 'header' }),
		superValidate({ lines, version: shipment.version }, zod4(shipmentLinesSchema), {
			errors: false,
			id: 'lines'
		}),
		superValidate({ version: shipment.version }, zod4(containerSchema), {
			errors: false,
			id: 'container'
		}),
		superValidate({ version: shipment.version }, zod4(lotSchema), { errors: false, id: 'lot' }),
		superValidate({ lots: [], version: shipment.version }, zod4(lotImportSchema), {
			errors: false,
			id: 'lot-import'
		}),
		listLots(shipment.id),
		cachedLoadPlan(user, shipment.id),
		documentRegister(user, shipment.id),
		superValidate(paperDetails, zod4(paperDetailsSchema), { errors: false, id: 'papers' }),
		superValidate({ kinds: [], reason: '' }, zod4(issuePapersSchema), {
			errors: false,
			id: 'issue'
		}),
		listDeposits(user, shipment.id),
		superValidate(
			{
				basis: 'amount' as const,
				currency: shipment.currency,
				dueDate: new Date(Date.now() + 14 * 86_400_000).toISOString().slice(0, 10)
			},
			zod4(depositRequestSchema),
			{ errors: false, id: 'deposit' }
		),
		supportingDocumentsData(event, { shipmentId: shipment.id }),
		isStaff(user.role) ? productsBySku(shipment.lines.map((l) => l.sku)) : null
	]);
	// Lithium guidance for the chosen mode (or the first considered), for staff only.
	const guidanceMode = shipment.chosenMode ?? shipment.modesConsidered[0] ?? null;
	const lithium =
		lineProducts && guidanceMode
			? shipmentLithiumView([...lineProducts.values()], guidanceMode)
			: null;
	const incoterm = isIncoterm(shipment.incoterm)
		? {
				term: `${shipment.incoterm} ${shipment.incotermPlace}`.trim(),
				obligations: incotermObligations(shipment.incoterm),
				matrix: responsibilityMatrix(shipment.incoterm),
				checks: incotermChecks({
					code: shipment.incoterm,
					namedPlace: shipment.incotermPlace,
					mode: shipment.chosenMode
				}).filter((c) => c.severity !== 'error'),
				source: `${INCOTERM_OBLIGATIONS_SOURCE.issuer}, ${INCOTERM_OBLIGATIONS_SOURCE.document}, ${INCOTERM_OBLIGATIONS_SOURCE.section} (${INCOTERM_OBLIGATIONS_SOURCE.basis})`
			}
		: null;
	// Offer the papers not yet issued; a reissue is chosen on purpose.
	issueForm.data.kinds = DOCUMENT_KINDS.filter(
		(k) => !papers?.papers.some((p) => p.kind === k && p.current)
	);
	return {
		shipment,
		measure: result,
		canEdit,
		editable,
		// "Documents issued" comes from the papers panel; offered here only when the papers stand.
		transitions: canEdit
			? allowedTransitions(shipment.status).filter(
					(to) =>
						to !== 'documents_issued' ||
						DOCUMENT_KINDS.every((k) =>
							papers?.papers.some((p) => p.kind === k && p.current && p.upToDate)
						)
				)
			: [],
		options: options && { ...options, currencies: countryAndCurrencyOptions().currencies },
		headerForm,
		linesForm,
		containerForm,
		lotForm,
		lotImportForm,
		lots,
		loadPlan,
		canPlanLoad: isStaff(user.role),
		papers,
		paperForm,
		issueForm,
		// null for brokers: deposits are between the exporter and its customer.
		deposits,
		depositForm,
		isCustomer: user.role === 'customer',
		canRequestDeposit: (DEPOSIT_REQUESTERS as readonly string[]).includes(user.role),
		currencies: countryAndCurrencyOptions().currencies,
		supporting,
		lithium: lithium && { ...lithium, mode: guidanceMode!, chosen: shipment.chosenMode !== null },
		incoterm
	};
};

const editor = (event: RequestEvent) => requireRole(event, 'admin', 'coordinator');

/** The deposit a cancel, refund or pay button names, or a 400 saying it is not one. */
async function depositAction(event: RequestEvent) {
	const data = await readForm(event.request);
	const parsed = depositActionSchema.safeParse({
		depositId: data.get('depositId') ?? '',
		version: data.get('version') ?? undefined
	});
	return parsed.success ? parsed.data : null;
}
const NO_DEPOSIT = { depositError: 'That deposit could not be identified.' };

/** Cancel and refund: the named deposit, the service, and the panel's note or error. */
async function depositStep<T>(
	event: RequestEvent,
	run: (depositId: string, version: number | undefined, ip: string) => Promise<ServiceResult<T>>,
	done: (value: T) => string
) {
	const target = await depositAction(event);
	if (!target) return fail(400, NO_DEPOSIT);
	const result = await run(target.depositId, target.version, event.getClientAddress());
	if (!result.ok) return fail(result.status, { depositError: result.message });
	return { depositDone: done(result.value) };
}

export const actions: Actions = {
	uploadSupporting: (event) =>
		uploadSupportingAction(event, { shipmentId: event.params.shipmentId }),
	retireSupporting: (event) =>
		retireSupportingAction(event, { shipmentId: event.params.shipmentId }),
	header: async (event) => {
		const user = editor(event);
		const form = await validateForm(event.request, zod4(shipmentSchema), { id: 'header' });
		if (!form.valid) return fail(400, { form });
		const result = await updateShipment(
			user,
			event.params.shipmentId,
			form.data,
			event.getClientAddress()
		);
		if (!result.ok) return refuse(form, result);
		return message(form, { tone: 'ok', text: 'Shipment saved.' });
	},
	papers: async (event) => {
		const user = editor(event);
		const form = await validateForm(event.request, zod4(paperDetailsSchema), { id: 'papers' });
		if (!form.valid) return fail(400, { form });
		const result = await updatePaperDetails(
			user,
			event.params.shipmentId,
			form.data,
			event.getClientAddress()
		);
		if (!result.ok) return refuse(form, result);
		return message(form, { tone: 'ok', text: 'Details for the papers saved.' });
	},
	issuePapers: async (event) => {
		const user = editor(event);
		const form = await validateForm(event.request, zod4(issuePapersSchema), { id: 'issue' });
		if (!form.valid) return fail(400, { form });
		const result = await issuePapers(
			user,
			event.params.shipmentId,
			form.data,
			event.getClientAddress()
		);
		if (!result.ok) {
			// Readiness items are listed by the panel itself; only the reason is a field here.
			const reason = result.fieldErrors.reason;
			return refuse(form, { ...result, fieldErrors: reason ? { reason } : {} });
		}
		const issued = result.value.papers.map((p) => `${p.number} rev. ${p.revision}`).join(', ');
		form.data.reason = '';
		return message(form, { tone: 'ok', text: `Issued ${issued}.` });
	},
	lines: async (event) => {
		const user = editor(event);
		const form = await validateForm(event.request, zod4(shipmentLinesSchema), { id: 'lines' });
		if (!form.valid) return fail(400, { form });
		const result = await replaceLines(
			user,
			event.params.shipmentId,
			form.data,
			event.getClientAddress()
		);
		if (!result.ok) return refuse(form, result);
		return message(form, { tone: 'ok', text: `${result.value.lines} line(s) saved.` });
	},
	status: async (event) => {
		const user = editor(event);
		const data = await readForm(event.request);
		const parsed = statusChangeSchema.safeParse({
			to: data.get('to'),
			note: data.get('note') ?? '',
			version: Number(data.get('version'))
		});
		if (!parsed.success)
			return fail(400, { statusError: 'Choose one of the offered status changes.' });
		if (nulPaths(parsed.data.note).length) return fail(400, { statusError: NUL_MESSAGE });
		const result = await changeStatus(
			user,
			event.params.shipmentId,
			parsed.data,
			event.getClientAddress()
		);
		if (!result.ok) return fail(result.status, { statusError: result.message });
		return { statusChanged: parsed.data.to };
	},
	addContainer: async (event) => {
		const user = editor(event);
		const form = await validateForm(event.request, zod4(containerSchema), { id: 'container' });
		if (!form.valid) return fail(400, { form });
		const result = await addContainer(
			user,
			event.params.shipmentId,
			form.data,
			event.getClientAddress()
		);
		if (!result.ok) return refuse(form, result);
		return message(form, { tone: 'ok', text: `Container ${form.data.containerNumber} added.` });
	},
	removeContainer: async (event) => {
		const user = editor(event);
		const data = await readForm(event.request);
		const containerId = String(data.get('containerId') ?? '');
		const version = Number(data.get('version'));
		if (!/^[0-9a-f-]{36}$/i.test(containerId) || !Number.isInteger(version)) {
			return fail(400, { removeError: 'That container could not be identified.' });
		}
		const result = await removeContainer(
			user,
			event.params.shipmentId,
			containerId,
			version,
			event.getClientAddress()
		);
		if (!result.ok) return fail(result.status, { removeError: result.message });
		return { removed: true };
	},
	addLot: async (event) => {
		const user = editor(event);
		const form = await validateForm(event.request, zod4(lotSchema), { id: 'lot' });
		if (!form.valid) return fail(400, { form });
		const result = await addLot(user, event.params.shipmentId, form.data, event.getClientAddress());
		if (!result.ok) return refuse(form, result);
		return message(form, { tone: 'ok', text: `Lot ${form.data.lotNumber} recorded.` });
	},
	importLots: async (event) => {
		const user = editor(event);
		const form = await validateForm(event.request, zod4(lotImportSchema), { id: 'lot-import' });
		if (!form.valid) {
			return message(
				form,
				{ tone: 'error', text: 'Some rows are not valid: read the file again and check them.' },
				{ status: 400 }
			);
		}
		const result = await addLots(
			user,
			event.params.shipmentId,
			form.data.lots,
			form.data.version,
			event.getClientAddress()
		);
		if (!result.ok) return refuse(form, result);
		const n = result.value.ids.length;
		return message(form, { tone: 'ok', text: `${n} lot${n === 1 ? '' : 's'} recorded.` });
	},
	requestDeposit: async (event) => {
		const user = requireRole(event, ...DEPOSIT_REQUESTERS);
		const form = await validateForm(event.request, zod4(depositRequestSchema), { id: 'deposit' });
		if (!form.valid) return fail(400, { form });
		const result = await requestDeposit(user, event.params.shipmentId, form.data, {
			origin: event.url.origin,
			ip: event.getClientAddress()
		});
		if (!result.ok) return refuse(form, result);
		return message(form, { tone: 'ok', text: `Deposit of ${result.value.amount} requested.` });
	},
	cancelDeposit: async (event) => {
		const user = requireRole(event, ...DEPOSIT_REQUESTERS);
		return depositStep(
			event,
			(id, version, ip) => cancelDeposit(user, event.params.shipmentId, id, version, ip),
			() => 'Deposit cancelled.'
		);
	},
	refundDeposit: async (event) => {
		const user = requireRole(event, 'finance');
		return depositStep(
			event,
			(id, version, ip) => refundDeposit(user, event.params.shipmentId, id, version, ip),
			(v) => `Refund ${v.refundId} made.`
		);
	},
	payDeposit: async (event) => {
		const user = requireRole(event, 'customer');
		const target = await depositAction(event);
		if (!target) return fail(400, NO_DEPOSIT);
		const result = await startCheckout(
			user,
			event.params.shipmentId,
			target.depositId,
			event.url.origin
		);
		if (!result.ok) return fail(result.status, { depositError: result.message });
		// The payment provider's hosted page; the webhook, not this redirect, decides the outcome.
		redirect(303, result.value.url);
	},
	removeLot: async (event) => {
		const user = editor(event);
		const lotId = String((await readForm(event.request)).get('lotId') ?? '');
		if (!/^[0-9a-f-]{36}$/i.test(lotId))
			return fail(400, { lotError: 'That lot could not be identified.' });
		const result = await removeLot(user, event.params.shipmentId, lotId, event.getClientAddress());
		if (!result.ok) return fail(result.status, { lotError: result.message });
		return { lotRemoved: true };
	}
};
