import { findForms, hasMessages, parseActionResult } from './superform-data';

// What the fuzzer accepts as an answer to hostile input: never a 5xx; a refusal that says why
// (API: JSON with a message, and field paths when the body or query was invalid; form actions:
// a failure with field errors or the form's own message).

export interface Verdict {
	/** The request was refused (4xx): the database must be as it was. */
	rejected: boolean;
	status: number;
	problems: string[];
}

interface ApiError {
	message?: unknown;
	code?: unknown;
	issues?: { path?: unknown; message?: unknown }[];
}

export function judgeApi(status: number, contentType: string, text: string): Verdict {
	const problems: string[] = [];
	if (status >= 500) problems.push(`status ${status}: ${text.slice(0, 300)}`);
	// Node's HTTP parser answers an over-long URL (431) before the app sees the request.
	if (status === 431) return { rejected: true, status, problems };
	if (status >= 400) {
		let body: ApiError = {};
		if (!contentType.includes('application/json')) problems.push(`${status} is not JSON`);
		else body = JSON.parse(text) as ApiError;
		if (typeof body.message !== 'string' || !body.message) {
			problems.push(`${status} has no message: ${text.slice(0, 200)}`);
		}
		if (status === 400 && (body.code === 'invalid_body' || body.code === 'invalid_query')) {
			const issues = body.issues ?? [];
			if (issues.length === 0) problems.push(`${status} ${String(body.code)} names no field`);
			for (const issue of issues) {
				if (typeof issue.path !== 'string' || typeof issue.message !== 'string' || !issue.message) {
					problems.push(`issue without path and message: ${JSON.stringify(issue)}`);
				}
			}
		}
	}
	return { rejected: status >= 400, status, problems };
}

/** Whether a failure's data explains itself: field errors, a form message, or a named error. */
function explains(data: unknown): boolean {
	const forms = findForms(data);
	if (forms.some((f) => hasMessages(f.errors) || f.message)) return true;
	if (data !== null && typeof data === 'object') {
		return Object.values(data).some((v) => typeof v === 'string' && v.length > 0);
	}
	return false;
}

export function judgeAction(status: number, contentType: string, text: string): Verdict {
	const problems: string[] = [];
	if (status >= 500) problems.push(`status ${status}: ${text.slice(0, 300)}`);
	if (!contentType.includes('application/json')) {
		// SvelteKit answers a body it cannot read as form data before any action runs.
		if (status < 400) problems.push(`${status} ${contentType}: not an action result`);
		return { rejected: status >= 400, status, problems };
	}
	const result = parseActionResult(text);
	const code = result.status ?? status;
	if (result.type === 'failure') {
		if (code >= 500) problems.push(`failure ${code}`);
		if (!explains(result.data)) {
			problems.push(`failure ${code} without field errors or message: ${text.slice(0, 300)}`);
		}
		if (code === 400) {
			// A refused form names its fields when it is a superform that has any errors at all.
			const forms = findForms(result.data);
			const silent = forms.filter((f) => !hasMessages(f.errors) && !f.message);
			if (forms.length > 0 && silent.length === forms.length) {
				problems.push('failure 400 with a form that names no field');
			}
		}
		return { rejected: true, status: code, problems };
	}
	if (result.type === 'error') {
		if (code >= 500) problems.push(`error ${code}: ${JSON.stringify(result.error)}`);
		if (!result.error?.message) problems.push(`error ${code} without a message`);
		return { rejected: true, status: code, problems };
	}
	return { rejected: false, status: code, problems };
}

/** A page's GET: never a 5xx (a 4xx renders the error page, which is fine). */
export function judgePage(status: number, text: string): Verdict {
	const problems = status >= 500 ? [`status ${status}: ${text.slice(0, 300)}`] : [];
	return { rejected: status >= 400, status, problems };
}
