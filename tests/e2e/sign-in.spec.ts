import { expect, test } from '@playwright/test';
import { DEMO, signInPage, submitSignIn } from './helpers';

const NAVIGATION: Record<keyof typeof DEMO, string[]> = {
	admin: [
		'Overview',
		'Shipments',
		'Products',
		'Places & parties',
		'Pallets & containers',
		'Landed-cost data',
		'Trace a serial',
		'Organizations',
		'People & access',
		'Audit trail',
		'Outgoing mail'
	],
	coordinator: [
		'Overview',
		'Shipments',
		'Products',
		'Places & parties',
		'Pallets & containers',
		'Trace a serial',
		'Organizations'
	],
	finance: [
		'Overview',
		'Shipments',
		'Products',
		'Landed-cost data',
		'Trace a serial',
		'Organizations'
	],
	broker: ['Overview', 'Shipments', 'Products', 'Our firm'],
	customer: ['Overview', 'Shipments', 'Our company'],
	otherCustomer: ['Overview', 'Shipments', 'Our company']
};

test('an anonymous visitor is sent to the sign-in page', async ({ page }) => {
	await page.goto('/organizations');
	await expect(page).toHaveURL(/\/signin\?redirectTo=%2Forganizations$/);
	await expect(page.getByRole('heading', { name: 'Sign in' })).toBeVisible();
});

for (const [role, email] of Object.entries(DEMO) as [keyof typeof DEMO, string][]) {
	test(`${role} signs in, sees the role's navigation and signs out`, async ({ page }) => {
		await signInPage(page, email);
		await expect(page).toHaveURL('/');
		const nav = page.getByRole('navigation', { name: 'Main' });
		await expect(nav.getByRole('link')).toHaveText(NAVIGATION[role]);
		await page.getByRole('button', { name: 'Sign out' }).click();
		await expect(page).toHaveURL(/\/signin$/);
		await page.goto('/');
		await expect(page).toHaveURL(/\/signin/);
	});
}

test('after sign-in the user lands where they were going', async ({ page }) => {
	await page.goto('/admin/audit');
	await page.getByLabel('E-mail').fill(DEMO.admin);
	await page.getByLabel('Password').fill('Landfall-demo-2026');
	await page.getByRole('button', { name: 'Sign in' }).click();
	await expect(page).toHaveURL('/admin/audit');
	await expect(page.getByRole('heading', { name: 'Audit trail' })).toBeVisible();
});

test('unknown e-mail and wrong password get the very same message', async ({ page }) => {
	await submitSignIn(page, 'nobody-here@solvrae.example', 'whatever-password');
	const unknown = await page.getByRole('alert').textContent();
	await submitSignIn(page, DEMO.finance, 'not-the-password');
	const wrong = await page.getByRole('alert').textContent();
	expect(unknown?.trim()).toBe(wrong?.trim());
	expect(wrong).toContain('do not match an active Landfall account');
	// The address typed stays in the field; the password does not.
	await expect(page.getByLabel('E-mail')).toHaveValue(DEMO.finance);
	await expect(page.getByLabel('Password')).toHaveValue('');
});

test('a disabled account cannot sign in', async ({ page }) => {
	await submitSignIn(page, 'former.planner@solvrae.example');
	await expect(page.getByRole('alert')).toContainText('do not match an active Landfall account');
	await expect(page).toHaveURL(/\/signin/);
});

test('repeated failures for one address are throttled', async ({ page }) => {
	const email = `throttle-${Date.now()}@solvrae.example`;
	for (let i = 0; i < 5; i++) {
		await submitSignIn(page, email, `wrong-${i}`);
		await expect(page.getByRole('alert')).toContainText('do not match');
	}
	await submitSignIn(page, email, 'wrong-again');
	await expect(page.getByRole('alert')).toContainText('Too many failed sign-ins');
});

test('an empty form gets field errors, not a round trip to the server', async ({ page }) => {
	await page.goto('/signin');
	await page.getByRole('button', { name: 'Sign in' }).click();
	await expect(page.getByText('Enter your e-mail address')).toBeVisible();
	await expect(page.getByText('Enter your password.')).toBeVisible();
});

test('a signed-in user with the wrong role gets a 403 page', async ({ page }) => {
	await signInPage(page, DEMO.coordinator);
	await expect(page).toHaveURL('/');
	const response = await page.goto('/admin/users');
	expect(response?.status()).toBe(403);
	await expect(page.getByRole('heading', { name: 'Not part of your role' })).toBeVisible();
});

test('a customer cannot open another customer’s organization by URL', async ({ page }) => {
	await signInPage(page, DEMO.otherCustomer);
	await expect(page).toHaveURL('/');
	const otherHref = (await page.getByRole('link', { name: 'Our company' }).getAttribute('href'))!;
	await page.getByRole('button', { name: 'Sign out' }).click();
	await expect(page).toHaveURL(/\/signin$/);

	await signInPage(page, DEMO.customer);
	await expect(page).toHaveURL('/');
	const ownHref = await page.getByRole('link', { name: 'Our company' }).getAttribute('href');
	expect(ownHref).not.toBe(otherHref);
	const response = await page.goto(otherHref);
	expect(response?.status()).toBe(404);
	await expect(page.getByText('Wattlebird')).toHaveCount(0);
});
