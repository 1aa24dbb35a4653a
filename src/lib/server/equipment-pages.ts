import { error, fail, redirect, type RequestEvent } from '@sveltejs/kit';
import { message, superValidate } from 'sveltekit-superforms';
import { zod4, type ValidationAdapter } from 'sveltekit-superforms/adapters';
import { containerTypeInputSchema, palletTypeInputSchema } from '../schemas/equipment';
import { containerReference, palletReference } from '../reference/equipment-sources';
import { requireRole } from './auth/guard';
import type { SessionUser } from './auth/session-user';
import { refuse, validateForm } from './forms';
import type { ServiceResult } from './services/result';
import {
	containerFormValues,
	getContainerType,
	getPalletType,
	palletFormValues,
	saveContainerType,
	savePalletType
} from './services/equipment';

// Loads and actions of the pallet-type and container-type pages (new and edit), admin and
// coordinator only. `reference` is the data file's record (figures and sources) of a seeded type.

interface Spec<Input extends Record<string, unknown>, Row, Reference> {
	schema: ValidationAdapter<Input>;
	get: (id: string) => Promise<Row | null>;
	values: (row: Row) => Input;
	reference: (code: string) => Reference | null;
	save: (
		actor: SessionUser,
		id: string | null,
		input: Input,
		ip: string | null
	) => Promise<ServiceResult<{ id: string }>>;
	path: string;
	missing: string;
}

function pages<
	Input extends Record<string, unknown> & { version: number },
	Row extends { id: string; code: string; name: string; custom: boolean },
	Reference
>(k: Spec<Input, Row, Reference>) {
	return {
		async loadNew(event: RequestEvent) {
			requireRole(event, 'admin', 'coordinator');
			return { form: await superValidate(k.schema) };
		},
		async load(event: RequestEvent, id: string) {
			requireRole(event, 'admin', 'coordinator');
			const row = await k.get(id);
			if (!row) error(404, { message: k.missing });
			const stored = k.values(row);
			return {
				row: { id: row.id, code: row.code, name: row.name, custom: row.custom },
				stored,
				reference: row.custom ? null : k.reference(row.code),
				form: await superValidate(stored, k.schema)
			};
		},
		async save(event: RequestEvent, id: string | null) {
			const user = requireRole(event, 'admin', 'coordinator');
			const form = await validateForm(event.request, k.schema);
			if (!form.valid) return fail(400, { form });
			const result = await k.save(user, id, form.data, event.getClientAddress());
			if (!result.ok) return refuse(form, result);
			if (!id) redirect(303, `${k.path}/${result.value.id}`);
			(form.data as { version: number }).version += 1;
			return message(form, { tone: 'ok', text: 'Saved.' });
		}
	};
}

export const palletPages = pages({
	schema: zod4(palletTypeInputSchema),
	get: getPalletType,
	values: palletFormValues,
	reference: palletReference,
	save: savePalletType,
	path: '/equipment/pallet-types',
	missing: 'No such pallet type.'
});

export const containerPages = pages({
	schema: zod4(containerTypeInputSchema),
	get: getContainerType,
	values: containerFormValues,
	reference: containerReference,
	save: saveContainerType,
	path: '/equipment/container-types',
	missing: 'No such container type.'
});
