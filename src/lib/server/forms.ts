import { error } from '@sveltejs/kit';
import * as devalue from 'devalue';
import {
	SchemaError,
	message,
	setError,
	superValidate,
	type SuperValidateOptions,
	type SuperValidated
} from 'sveltekit-superforms';
import type { ValidationAdapter } from 'sveltekit-superforms/adapters';
import { NUL_MESSAGE, nulPaths } from '../schemas/nul-text';
import type { ServiceResult } from './services/result';

/** Puts a refused service result on the form: field errors inline, the summary on top. */
export function refuse<T extends Record<string, unknown>>(
	form: SuperValidated<T>,
	result: Extract<ServiceResult<unknown>, { ok: false }>
) {
	for (const [field, text] of Object.entries(result.fieldErrors)) {
		setError(form, field as never, text);
	}
	return message(form, { tone: 'error', text: result.message }, { status: result.status });
}

const UNREADABLE = 'The form could not be read. Reload the page and send it again.';
const TOO_LARGE = 'The form is too large to send.';

function isTooLarge(cause: unknown): boolean {
	for (let e = cause; e && typeof e === 'object'; e = (e as { cause?: unknown }).cause) {
		if ((e as { status?: unknown }).status === 413) return true;
	}
	return false;
}

/**
 * The posted form's fields. A body that is not form data (wrong content type, broken multipart)
 * is a 400 and one over BODY_SIZE_LIMIT a 413, both with a message, never a 500.
 */
export async function readForm(request: Request): Promise<FormData> {
	try {
		return await request.formData();
	} catch (cause) {
		if (isTooLarge(cause))
			error(413, { message: 'The form is too large to send.', code: 'too_large' });
		error(400, { message: UNREADABLE, code: 'invalid_form' });
	}
}

/** A superforms path ('lines[0].unitPrice') from its parts. */
function formPath(path: (string | number)[]): string {
	return path.reduce<string>(
		(text, key) => (typeof key === 'number' ? `${text}[${key}]` : text ? `${text}.${key}` : key),
		''
	);
}

/**
 * The first place where superforms' JSON (devalue) holds more than plain data: a cycle, or a
 * Date, Map, Set, RegExp, BigInt… that no Landfall form sends. Superforms would recurse forever
 * on a cycle, and none of these can be validated as a form field.
 */
function notPlainData(
	value: unknown,
	path: (string | number)[] = [],
	above = new Set<unknown>()
): (string | number)[] | null {
	if (value === null || value === undefined) return null;
	if (typeof value === 'bigint' || typeof value === 'symbol' || typeof value === 'function') {
		return path;
	}
	if (typeof value !== 'object') return null;
	const plain = Array.isArray(value) || Object.getPrototypeOf(value) === Object.prototype;
	if (!plain || above.has(value)) return path;
	above.add(value);
	for (const [key, child] of Object.entries(value)) {
		const found = notPlainData(child, [...path, Array.isArray(value) ? Number(key) : key], above);
		if (found) return found;
	}
	above.delete(value);
	return null;
}

function isFile(value: unknown): value is Blob {
	return typeof Blob !== 'undefined' && value instanceof Blob;
}

/** Files where the form takes none: removed from the data (they cannot be sent back) and named. */
function strayFiles(
	value: unknown,
	allowed: Set<string>,
	path: (string | number)[] = []
): (string | number)[][] {
	if (value === null || typeof value !== 'object') return [];
	const found: (string | number)[][] = [];
	const record = value as Record<string, unknown>;
	for (const [key, child] of Object.entries(record)) {
		const at = [...path, Array.isArray(value) ? Number(key) : key];
		if (isFile(child)) {
			if (path.length === 0 && allowed.has(key)) continue;
			record[key] = undefined;
			found.push(at);
		} else found.push(...strayFiles(child, allowed, at));
	}
	return found;
}

export type ValidateFormOptions<T extends Record<string, unknown>> = SuperValidateOptions<T> & {
	/** Top-level fields that take a file; a file anywhere else is refused on its field. */
	files?: string[];
};

/**
 * superValidate for a posted form, hardened against what no page of ours sends: unreadable
 * bodies, nested data posted as plain fields, cyclic or exotic __superform_json, files in text
 * fields and NUL characters. Each becomes a field error (or a form-level one) on an invalid form;
 * `posted` stays false only when the body went past BODY_SIZE_LIMIT.
 */
export async function validateForm<
	T extends Record<string, unknown>,
	// superValidate's own default for the message type (the app declares none)
	// eslint-disable-next-line @typescript-eslint/no-explicit-any
	M = any,
	In extends Record<string, unknown> = T
>(
	request: Request,
	adapter: ValidationAdapter<T, In>,
	options: ValidateFormOptions<T> = {}
): Promise<SuperValidated<T, M, In>> {
	const { files = [], ...superOptions } = options;
	const refused = async (path: (string | number)[], text: string, posted = true) => {
		const form = await superValidate<T, M, In>(adapter, { ...superOptions, errors: false });
		form.posted = posted;
		if (path.length) setError(form, formPath(path) as never, text);
		else setError(form, text);
		return form;
	};

	let data: FormData;
	try {
		data = await request.formData();
	} catch (cause) {
		const tooLarge = isTooLarge(cause);
		return refused([], tooLarge ? TOO_LARGE : UNREADABLE, !tooLarge);
	}
	const json = data.getAll('__superform_json').join('');
	if (json) {
		let parsed: unknown;
		try {
			parsed = devalue.parse(json);
		} catch {
			parsed = undefined; // superforms then reads the plain fields, as it does itself
		}
		const bad = notPlainData(parsed);
		if (bad) return refused(bad, 'This value is not one the form can take.');
	}

	let form: SuperValidated<T, M, In>;
	try {
		form = await superValidate<T, M, In>(data, adapter, superOptions);
	} catch (cause) {
		if (!(cause instanceof SchemaError) && !(cause instanceof SyntaxError)) throw cause;
		// A list or object posted as a plain field (superforms wants __superform_json for those).
		const path = cause instanceof SchemaError && cause.path ? cause.path.split('.') : [];
		return refused(path, 'This field holds a list or a group of fields: reload the page.');
	}
	for (const path of strayFiles(form.data, new Set(files))) {
		setError(form, formPath(path) as never, 'A file cannot go in this field.');
	}
	for (const path of nulPaths(form.data)) {
		if (path.length) setError(form, formPath(path) as never, NUL_MESSAGE);
	}
	return form;
}
