import { expect, test } from '@playwright/test';
import { DEMO, gotoHydrated, signInPage } from './helpers';

test('an administrator adds a person, fixes a field error, then disables them', async ({
	page
}) => {
	const stamp = Date.now();
	const email = `new.planner.${stamp}@solvrae.example`;
	await signInPage(page, DEMO.admin);
	await page.getByRole('link', { name: 'People & access' }).click();

	const form = page.getByRole('region', { name: 'Add a person' });
	await form.getByLabel('Name').fill('Nur Aisyah Hamid');
	await form.getByLabel('E-mail').fill(email);
	await form.getByLabel('Role').selectOption('coordinator');
	await form.getByLabel('Organization').selectOption({ label: 'Solvrae Electronics Sdn. Bhd.' });
	await form.getByLabel('First password').fill('short');
	await form.getByRole('button', { name: 'Add person' }).click();
	await expect(form.getByText('Password too short')).toBeVisible();
	// Nothing typed is lost on a failed submit (except the password).
	await expect(form.getByLabel('Name')).toHaveValue('Nur Aisyah Hamid');
	await expect(form.getByLabel('E-mail')).toHaveValue(email);

	await form.getByLabel('First password').fill('a-long-enough-password');
	await form.getByRole('button', { name: 'Add person' }).click();
	await expect(form.getByRole('status')).toContainText(`can now sign in as ${email}`);

	await page.getByRole('link', { name: 'Nur Aisyah Hamid' }).first().click();
	await page.getByLabel('Disable sign-in').check();
	await page.getByRole('button', { name: 'Save' }).click();
	await expect(page.getByRole('status')).toHaveText('Saved.');

	const userId = page.url().split('/').pop();
	await page.getByRole('link', { name: 'Audit trail' }).click();
	await expect(page.getByRole('heading', { name: 'Audit trail' })).toBeVisible();
	// Other tests write audit events at the same time: look this person's events up by id.
	const audit = (await (await page.request.get('/api/v1/audit-events?limit=500')).json()) as {
		rows: { action: string; entityId: string }[];
	};
	const actions = audit.rows.filter((e) => e.entityId === userId).map((e) => e.action);
	expect(actions).toEqual(expect.arrayContaining(['user.create', 'user.disable']));
});

test('the same e-mail in other letter case is refused', async ({ page }) => {
	await signInPage(page, DEMO.admin);
	await gotoHydrated(page, '/admin/users');
	const form = page.getByRole('region', { name: 'Add a person' });
	await form.getByLabel('Name').fill('Duplicate Person');
	await form.getByLabel('E-mail').fill('Coordinator@Solvrae.example');
	await form.getByLabel('Role').selectOption('coordinator');
	await form.getByLabel('Organization').selectOption({ label: 'Solvrae Electronics Sdn. Bhd.' });
	await form.getByLabel('First password').fill('a-long-enough-password');
	await form.getByRole('button', { name: 'Add person' }).click();
	await expect(form.getByText('Someone already signs in with this e-mail address.')).toBeVisible();
});

test('an administrator issues an API token that works on the API only, then revokes it', async ({
	page,
	playwright,
	baseURL
}) => {
	await signInPage(page, DEMO.admin);
	await gotoHydrated(page, '/admin/users');
	await page.getByRole('link', { name: 'Daniel Tan Wei Jie' }).click();
	const name = `ERP export ${Date.now()}`;
	await page.getByLabel('Token name').fill(name);
	await page.getByRole('button', { name: 'Issue token' }).click();
	const token = (await page.getByTestId('new-token').textContent())!.trim();
	expect(token).toMatch(/^lf_[A-Za-z0-9_-]{40,}$/);

	const api = await playwright.request.newContext({
		baseURL,
		extraHTTPHeaders: { authorization: `Bearer ${token}` }
	});
	const me = await api.get('/api/v1/me');
	expect(me.status()).toBe(200);
	expect((await me.json()).email).toBe(DEMO.coordinator);
	expect((await api.get('/api/v1/shipments')).status()).toBe(200);
	// A token is not a page session.
	expect((await api.get('/shipments', { maxRedirects: 0 })).status()).toBe(303);

	await page
		.getByRole('button', { name: /^Revoke token ERP export/ })
		.first()
		.click();
	await expect(page.getByText('Revoked').first()).toBeVisible();
	const after = await api.get('/api/v1/me');
	expect(after.status()).toBe(401);
	expect((await after.json()).code).toBe('invalid_token');
	await api.dispose();
});
