import { error, fail, redirect, type RequestEvent } from '@sveltejs/kit';
import { message, superValidate } from 'sveltekit-superforms';
import { zod4, type ValidationAdapter } from 'sveltekit-superforms/adapters';
import { REFERENCE_DATA_EDITORS, REFERENCE_DATA_READERS, canEditReferenceData } from '../roles';
import { retireSchema } from '../schemas/reference-data';
import { requireRole } from './auth/guard';
import type { SessionUser } from './auth/session-user';
import { refuse, validateForm } from './forms';
import type { ServiceResult } from './services/result';

// Loads and actions of the dated reference rows' pages (rate cards, country rules, fees, de
// minimis): an add form on a list page, and an edit page with "save" and "retire". Finance and
// administrators edit; coordinators read. Every load and action checks the role itself.

type Result = Promise<ServiceResult<{ id: string }>>;

export interface DatedRowSpec<Input extends Record<string, unknown>, Row> {
	schema: ValidationAdapter<Input>;
	/** The superform id of the add form (several forms share a page). */
	formId: string;
	get: (id: string) => Promise<Row | null>;
	values: (row: Row) => Input;
	save: (actor: SessionUser, id: string | null, input: Input, ip: string | null) => Result;
	retire: (
		actor: SessionUser,
		id: string,
		version: number,
		validTo: string,
		ip: string | null
	) => Result;
	/** The route parameter of the edit page, and the path its id is appended to. */
	param: string;
	path: string;
	missing: string;
	saved: string;
}

const today = () => new Date().toISOString().slice(0, 10);
const idOf = (event: RequestEvent, param: string) =>
	(event.params as Record<string, string>)[param]!;

export function datedRowPages<
	Input extends Record<string, unknown> & { version: number },
	Row extends { id: string; version: number; validTo: string | null }
>(spec: DatedRowSpec<Input, Row>) {
	return {
		/** The empty add form (optionally with some fields filled, e.g. the country). */
		addForm: (values?: Partial<Input>) =>
			values
				? superValidate(values, spec.schema, { id: spec.formId, errors: false })
				: superValidate(spec.schema, { id: spec.formId }),

		/** The add action: on success the new row's page. */
		async add(event: RequestEvent) {
			const user = requireRole(event, ...REFERENCE_DATA_EDITORS);
			const form = await validateForm(event.request, spec.schema, { id: spec.formId });
			if (!form.valid) return fail(400, { form });
			const result = await spec.save(user, null, form.data, event.getClientAddress());
			if (!result.ok) return refuse(form, result);
			redirect(303, `${spec.path}/${result.value.id}?saved=1`);
		},

		/** Returns: row, canEdit, saved (just added), form (edit), retireForm. */
		async load(event: RequestEvent) {
			const user = requireRole(event, ...REFERENCE_DATA_READERS);
			const row = await spec.get(idOf(event, spec.param));
			if (!row) error(404, { message: spec.missing, code: 'not_found' });
			return {
				row,
				canEdit: canEditReferenceData(user.role),
				saved: event.url.searchParams.has('saved'),
				form: await superValidate(spec.values(row), spec.schema, { errors: false }),
				retireForm: await superValidate(
					{ validTo: row.validTo ?? today(), version: row.version },
					zod4(retireSchema),
					{ id: 'retire', errors: false }
				)
			};
		},

		actions: {
			save: async (event: RequestEvent) => {
				const user = requireRole(event, ...REFERENCE_DATA_EDITORS);
				const form = await validateForm(event.request, spec.schema);
				if (!form.valid) return fail(400, { form });
				const id = idOf(event, spec.param);
				const result = await spec.save(user, id, form.data, event.getClientAddress());
				if (!result.ok) return refuse(form, result);
				form.data.version += 1;
				return message(form, { tone: 'ok', text: spec.saved });
			},
			retire: async (event: RequestEvent) => {
				const user = requireRole(event, ...REFERENCE_DATA_EDITORS);
				const form = await validateForm(event.request, zod4(retireSchema), { id: 'retire' });
				if (!form.valid) return fail(400, { form });
				const { validTo, version } = form.data;
				const id = idOf(event, spec.param);
				const result = await spec.retire(user, id, version, validTo, event.getClientAddress());
				if (!result.ok) return refuse(form, result);
				return message(form, { tone: 'ok', text: `Valid until ${validTo}.` });
			}
		}
	};
}
