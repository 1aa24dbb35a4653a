import type { ServiceResult } from '$lib/server/services/result';

/** The value of a service call the test expects to succeed; a refusal fails the test with its reason. */
export function ok<T>(result: ServiceResult<T>, what: string): T {
	if (!result.ok) throw new Error(`${what} was refused: ${JSON.stringify(result)}`);
	return result.value;
}
