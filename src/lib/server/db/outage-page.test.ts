import { describe, expect, it } from 'vitest';
import { outagePage } from './outage-page';

describe('outagePage', () => {
	it('says what happened, when to retry, and links back to the address asked for', () => {
		const html = outagePage('Landfall cannot reach its database just now.', 5, '/shipments?q=SHP');
		expect(html).toContain('<h1>Back in a moment</h1>');
		expect(html).toContain('Landfall cannot reach its database just now.');
		expect(html).toContain('href="/shipments?q=SHP"');
		expect(html).toContain('5 seconds');
		expect(html).not.toMatch(/<script/i);
	});

	it('escapes the address, so a crafted link cannot inject markup', () => {
		const html = outagePage('x', 5, '/a"><script>alert(1)</script>');
		expect(html).not.toContain('<script>');
		expect(html).toContain('&#34;&#62;&#60;script&#62;');
	});
});
