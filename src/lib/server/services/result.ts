// What every service returns: the value, or a refusal the routes turn into a 4xx with field errors.

export type FieldErrors = Record<string, string>;

export type Refusal = {
	ok: false;
	/** 502/503: a service Landfall depends on (the payment provider) refused or is not set up. */
	status: 400 | 403 | 404 | 409 | 502 | 503;
	message: string;
	fieldErrors: FieldErrors;
};

export type ServiceResult<T> = { ok: true; value: T } | Refusal;

export function refused(
	status: Refusal['status'],
	message: string,
	fieldErrors: FieldErrors = {}
): Refusal {
	return { ok: false, status, message, fieldErrors };
}

/** A 400 naming the fields at fault. */
export function invalid(
	fieldErrors: FieldErrors,
	message = 'Check the highlighted fields.'
): Refusal {
	return refused(400, message, fieldErrors);
}
