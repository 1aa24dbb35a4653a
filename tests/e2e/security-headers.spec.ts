import { expect, test, type Page } from '@playwright/test';
import { DEMO, DEMO_PASSWORD, signInPage } from './helpers';

// The Content-Security-Policy must not break any screen: each page below is opened with the
// browser reporting every violation, and the headers themselves are checked once.

async function collectViolations(page: Page): Promise<string[]> {
	const found: string[] = [];
	await page.exposeFunction('reportCspViolation', (text: string) => found.push(text));
	await page.addInitScript(() => {
		document.addEventListener('securitypolicyviolation', (e) => {
			(window as unknown as { reportCspViolation(t: string): void }).reportCspViolation(
				`${e.violatedDirective} ${e.blockedURI}`
			);
		});
	});
	return found;
}

test('pages carry the security headers and a policy that blocks foreign scripts', async ({
	request
}) => {
	const response = await request.get('/signin');
	const headers = response.headers();
	const csp = headers['content-security-policy'] ?? '';
	expect(csp).toContain("script-src 'self'");
	expect(csp).toContain("frame-ancestors 'none'");
	expect(csp).toContain("form-action 'self'");
	expect(headers['x-content-type-options']).toBe('nosniff');
	expect(headers['x-frame-options']).toBe('DENY');
	expect(headers['referrer-policy']).toBe('same-origin');
	expect(headers['cross-origin-opener-policy']).toBe('same-origin');
});

test('the session cookie is HttpOnly and SameSite=Lax (and Secure when ORIGIN is https)', async ({
	request,
	baseURL
}) => {
	const response = await request.post('/signin', {
		form: { email: DEMO.coordinator, password: DEMO_PASSWORD },
		headers: { accept: 'application/json', origin: baseURL! }
	});
	const session = response
		.headersArray()
		.filter((h) => h.name.toLowerCase() === 'set-cookie')
		.map((h) => h.value)
		.find((v) => /^(__Secure-)?authjs\.session-token=/.test(v));
	expect(session).toBeDefined();
	expect(session).toMatch(/; HttpOnly/i);
	expect(session).toMatch(/; SameSite=Lax/i);
	expect(session).toMatch(/; Path=\//i);
	// These tests run over http on loopback, so no Secure flag here; with ORIGIN=https://… Auth.js
	// names it __Secure-authjs.session-token and adds Secure (README, "Security notes").
});

test('a form posted from another origin is refused (SvelteKit’s origin check is on)', async ({
	request
}) => {
	for (const origin of ['http://evil.example', 'null']) {
		const response = await request.post('/signin', {
			form: { email: DEMO.coordinator, password: DEMO_PASSWORD },
			headers: { origin },
			maxRedirects: 0
		});
		expect(response.status(), origin).toBe(403);
		expect(response.headers()['set-cookie'] ?? '').not.toContain('session-token');
	}
});

test('no screen breaks the Content-Security-Policy', async ({ page }) => {
	test.setTimeout(90_000);
	const violations = await collectViolations(page);
	await signInPage(page, DEMO.finance);
	await page.goto('/shipments');
	const first = page.getByRole('table').getByRole('link').first();
	const href = await first.getAttribute('href');
	for (const path of [
		'/',
		'/shipments',
		href!,
		`${href}/landed-cost`,
		'/products',
		'/reference/rate-cards',
		'/reference/country-rules',
		'/reference/settings'
	]) {
		await page.goto(path);
		await page.waitForLoadState('networkidle');
		expect(violations, `CSP violations on ${path}`).toEqual([]);
	}
});
