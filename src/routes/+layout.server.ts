import type { LayoutServerLoad } from './$types';

// The signed-in user (or null) for every page; holds no secrets.
export const load: LayoutServerLoad = ({ locals }) => ({ user: locals.user });
