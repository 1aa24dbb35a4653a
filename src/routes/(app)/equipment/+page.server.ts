import { requireRole } from '$lib/server/auth/guard';
import { listEquipment } from '$lib/server/services/equipment';
import type { PageServerLoad } from './$types';

// Returns: palletTypes, containerTypes (reference ones from data/*.json, and custom ones).
export const load: PageServerLoad = async (event) => {
	requireRole(event, 'admin', 'coordinator');
	return listEquipment();
};
