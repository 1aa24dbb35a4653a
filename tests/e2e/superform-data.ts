import type { APIRequestContext } from '@playwright/test';
import * as devalue from 'devalue';

// Reading what SvelteKit sends back: an action's JSON result ({ type, status, data } with data in
// devalue's format, as use:enhance receives it) and a page's __data.json, and finding the
// superforms (id, data, errors, message) inside either.

export interface FoundForm {
	id: string;
	data: Record<string, unknown>;
	errors: Record<string, unknown>;
	message?: unknown;
}

export interface ActionResult {
	type: 'success' | 'failure' | 'redirect' | 'error';
	status?: number;
	data?: unknown;
	error?: { message?: string };
	location?: string;
}

/** The action result of a response to a request sent with `x-sveltekit-action: true`. */
export function parseActionResult(text: string): ActionResult {
	const result = JSON.parse(text) as ActionResult & { data?: string };
	if (typeof result.data === 'string') result.data = devalue.parse(result.data);
	return result;
}

function isForm(value: unknown): value is FoundForm {
	return (
		value !== null &&
		typeof value === 'object' &&
		typeof (value as FoundForm).id === 'string' &&
		'data' in value &&
		'errors' in value &&
		'valid' in value
	);
}

/** Every superform in a value (a page's data or a failure's), depth first. */
export function findForms(value: unknown, found: FoundForm[] = [], seen = new Set()): FoundForm[] {
	if (value === null || typeof value !== 'object' || seen.has(value)) return found;
	seen.add(value);
	if (isForm(value)) found.push(value);
	else for (const child of Object.values(value)) findForms(child, found, seen);
	return found;
}

/** The superforms a page's load returns, read from its __data.json as the signed-in client. */
export async function pageForms(client: APIRequestContext, pagePath: string): Promise<FoundForm[]> {
	const response = await client.get(`${pagePath.replace(/\/$/, '')}/__data.json`);
	if (!response.ok()) return [];
	const { nodes } = (await response.json()) as {
		nodes: ({ type: string; data?: unknown[] } | null)[];
	};
	return nodes.flatMap((node) =>
		node?.type === 'data' && node.data ? findForms(devalue.unflatten(node.data)) : []
	);
}

/** Whether a field's error entry holds at least one message (superforms nests them). */
export function hasMessages(errors: unknown): boolean {
	if (typeof errors === 'string') return errors.length > 0;
	if (Array.isArray(errors)) return errors.some(hasMessages);
	if (errors !== null && typeof errors === 'object') return Object.values(errors).some(hasMessages);
	return false;
}
