import type { ParamMatcher } from '@sveltejs/kit';

// Ids are UUIDs; anything else is a 404 before a load runs or a query is made.
export const match: ParamMatcher = (param) =>
	/^[0-9a-f]{8}-[0-9a-f]{4}-[1-8][0-9a-f]{3}-[89ab][0-9a-f]{3}-[0-9a-f]{12}$/i.test(param);
