import { json } from '@sveltejs/kit';
import { measure } from '$lib/packing';
import { measureInputSchema } from '$lib/packing/schema';
import { readJson } from '$lib/server/api';
import { requireRole } from '$lib/server/auth/guard';
import type { RequestHandler } from './$types';

// Stateless: products, packaging and lines in; cartons, pallets, weights and chargeable weights out.
export const POST: RequestHandler = async (event) => {
	requireRole(event, 'admin', 'coordinator', 'finance', 'broker');
	const input = await readJson(event.request, measureInputSchema);
	const result = measure(input);
	if (!result.ok) {
		return json(
			{
				message: 'These lines cannot be measured yet.',
				code: 'invalid_body',
				issues: result.problems
			},
			{ status: 400 }
		);
	}
	return json(result);
};
