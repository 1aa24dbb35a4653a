import AxeBuilder from '@axe-core/playwright';
import { expect, test } from '@playwright/test';
import { DEMO, caughtMail, gotoHydrated, linkIn, signInPage } from './helpers';

// An administrator invites a person by e-mail; the invitation is read from the local mail
// catcher; its link sets the password once; the person then signs in with it.
test('invitation → set password → sign in; the link works once', async ({ page, browser }) => {
	const email = `invited.${Date.now()}@solvrae.example`;
	await signInPage(page, DEMO.admin);
	await gotoHydrated(page, '/admin/users');
	const form = page.getByRole('region', { name: 'Add a person' });
	await form.getByLabel('Name').fill('Mei Ling Tan');
	await form.getByLabel('E-mail').fill(email);
	await form.getByLabel('Role').selectOption('finance');
	await form.getByLabel('Organization').selectOption({ label: 'Solvrae Electronics Sdn. Bhd.' });
	await form.getByRole('button', { name: 'Invite by e-mail' }).click();
	await expect(form.getByText(`Invitation e-mailed to ${email}`)).toBeVisible();

	const mail = await caughtMail(email, (m) => m.subject.includes('choose a password'));
	const link = linkIn(mail, 'Choose a password');
	expect(link).toMatch(/\/set-password\/[\w-]{40,}$/);

	const context = await browser.newContext();
	const invitee = await context.newPage();
	await gotoHydrated(invitee, link);
	await expect(invitee.getByRole('heading', { name: 'Choose a password' })).toBeVisible();
	await expect(invitee.getByText(email)).toBeVisible();
	// WCAG 2.1 A/AA through axe, as in accessibility.spec.ts: nothing serious or critical.
	const axe = await new AxeBuilder({ page: invitee })
		.withTags(['wcag2a', 'wcag2aa', 'wcag21a', 'wcag21aa'])
		.analyze();
	expect(axe.violations.filter((v) => v.impact === 'serious' || v.impact === 'critical')).toEqual(
		[]
	);
	await invitee.getByLabel('New password').fill('short');
	await invitee.getByLabel('The same password again').fill('short');
	await invitee.getByRole('button', { name: 'Save the password' }).click();
	await expect(invitee.getByText('Password too short')).toBeVisible();

	const password = 'Invited-person-password-2026';
	await invitee.getByLabel('New password').fill(password);
	await invitee.getByLabel('The same password again').fill(password);
	await invitee.getByRole('button', { name: 'Save the password' }).click();
	await expect(invitee).toHaveURL(/\/signin\?password-set=1/);
	await expect(invitee.getByRole('status')).toHaveText(/Your password is saved/);
	await invitee.getByLabel('E-mail').fill(email);
	await invitee.getByLabel('Password').fill(password);
	await invitee.getByRole('button', { name: 'Sign in' }).click();
	await expect(invitee).toHaveURL((url) => !url.pathname.startsWith('/signin'));

	// The same link a second time: refused, nothing to fill in.
	await gotoHydrated(invitee, link);
	await expect(invitee.getByRole('alert')).toHaveText(/no longer valid/);
	await context.close();
});
