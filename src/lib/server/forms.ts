import { message, setError, type SuperValidated } from 'sveltekit-superforms';
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
