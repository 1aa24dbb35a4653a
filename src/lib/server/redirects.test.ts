import { describe, expect, it } from 'vitest';
import { safeRedirectPath } from './redirects';

describe('safeRedirectPath', () => {
	it('keeps same-site paths with their query', () => {
		expect(safeRedirectPath('/organizations?x=1')).toBe('/organizations?x=1');
	});
	it('refuses other hosts and tricks that browsers treat as other hosts', () => {
		for (const bad of [
			'https://evil.example/',
			'//evil.example',
			'/\\evil.example',
			'javascript:alert(1)',
			''
		]) {
			expect(safeRedirectPath(bad)).toBe('/');
		}
	});
	it('never sends a signed-in user back to sign-in or sign-out', () => {
		expect(safeRedirectPath('/signin?redirectTo=/x')).toBe('/');
		expect(safeRedirectPath('/signout')).toBe('/');
	});
});
