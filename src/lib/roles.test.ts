import { describe, expect, it } from 'vitest';
import { ROLES, canEditReferenceData, isRole, isStaff, navigationFor } from './roles';

describe('roles', () => {
	it('recognises exactly the five roles', () => {
		expect(ROLES).toEqual(['admin', 'coordinator', 'broker', 'finance', 'customer']);
		expect(isRole('admin')).toBe(true);
		expect(isRole('Admin')).toBe(false);
		expect(isRole(undefined)).toBe(false);
	});

	it('treats only the exporter staff as staff', () => {
		expect(ROLES.filter(isStaff)).toEqual(['admin', 'coordinator', 'finance']);
	});

	it('points external roles at their own organization only', () => {
		const id = '00000000-0000-4000-8000-000000000001';
		for (const role of ['broker', 'customer'] as const) {
			const hrefs = navigationFor(role, id).map((item) => item.href);
			expect(hrefs).toContain(`/organizations/${id}`);
			expect(hrefs).not.toContain('/organizations');
			expect(hrefs.some((h) => h.startsWith('/admin'))).toBe(false);
		}
		expect(navigationFor('admin', id).map((i) => i.href)).toContain('/admin/users');
	});

	it('gives finance and administrators the landed-cost data, and only they edit it', () => {
		const id = '00000000-0000-4000-8000-000000000001';
		const withEntry = ROLES.filter((role) =>
			navigationFor(role, id).some((i) => i.href === '/reference/exchange-rates')
		);
		expect(withEntry).toEqual(['admin', 'finance']);
		expect(ROLES.filter(canEditReferenceData)).toEqual(['admin', 'finance']);
	});
});
