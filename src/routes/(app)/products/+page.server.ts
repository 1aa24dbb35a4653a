import { requireRole } from '$lib/server/auth/guard';
import { listProducts } from '$lib/server/services/products';
import { formatHsCode } from '$lib/trade/hs-code';
import type { PageServerLoad } from './$types';

// Returns: products (with packaging), canEdit.
export const load: PageServerLoad = async (event) => {
	const user = requireRole(event, 'admin', 'coordinator', 'finance', 'broker');
	const products = (await listProducts()).map((p) => ({
		...p,
		hsFormatted: formatHsCode(p.hsCode)
	}));
	return { products, canEdit: user.role === 'admin' || user.role === 'coordinator' };
};
