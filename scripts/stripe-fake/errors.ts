// Stripe's error answers: `{ error: { type, code?, param?, message } }` with its status codes.
// The SDK turns each into the matching Stripe…Error class.

export class StripeFakeError extends Error {
	constructor(
		readonly status: number,
		readonly type:
			| 'invalid_request_error'
			| 'idempotency_error'
			| 'card_error'
			| 'api_error'
			| 'authentication_error',
		message: string,
		readonly code?: string,
		readonly param?: string
	) {
		super(message);
	}

	body() {
		return {
			error: {
				type: this.type,
				message: this.message,
				...(this.code ? { code: this.code } : {}),
				...(this.param ? { param: this.param } : {})
			}
		};
	}
}

export const missingParam = (param: string) =>
	new StripeFakeError(
		400,
		'invalid_request_error',
		`Missing required param: ${param}.`,
		'parameter_missing',
		param
	);

export const invalidParam = (param: string, message: string) =>
	new StripeFakeError(400, 'invalid_request_error', message, 'parameter_invalid_integer', param);

export const noSuch = (object: string, id: string) =>
	new StripeFakeError(
		404,
		'invalid_request_error',
		`No such ${object}: '${id}'`,
		'resource_missing',
		'id'
	);
