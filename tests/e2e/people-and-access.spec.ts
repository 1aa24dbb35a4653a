import { expect, test } from '@playwright/test';
import { DEMO, signInPage } from './helpers';

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

	await page.getByRole('link', { name: 'Audit trail' }).click();
	await expect(page.getByRole('cell', { name: 'user.disable' }).first()).toBeVisible();
	await expect(page.getByRole('cell', { name: 'user.create' }).first()).toBeVisible();
});

test('the same e-mail in other letter case is refused', async ({ page }) => {
	await signInPage(page, DEMO.admin);
	await page.goto('/admin/users');
	const form = page.getByRole('region', { name: 'Add a person' });
	await form.getByLabel('Name').fill('Duplicate Person');
	await form.getByLabel('E-mail').fill('Coordinator@Solvrae.example');
	await form.getByLabel('Role').selectOption('coordinator');
	await form.getByLabel('Organization').selectOption({ label: 'Solvrae Electronics Sdn. Bhd.' });
	await form.getByLabel('First password').fill('a-long-enough-password');
	await form.getByRole('button', { name: 'Add person' }).click();
	await expect(form.getByText('Someone already signs in with this e-mail address.')).toBeVisible();
});
