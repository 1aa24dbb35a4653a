import { expect, request, type APIRequestContext, type Page } from '@playwright/test';
import type { Role } from '../../src/lib/roles';

export const DEMO_PASSWORD = 'Landfall-demo-2026';

/** One demo user per role (seeders/demo-scenario.ts), plus a second customer organization. */
export const DEMO: Record<Role | 'otherCustomer', string> = {
	admin: 'admin@solvrae.example',
	coordinator: 'coordinator@solvrae.example',
	finance: 'finance@solvrae.example',
	broker: 'broker@kaaiman.example',
	customer: 'buyer@hallvik.example',
	otherCustomer: 'buyer@wattlebird.example'
};

/** Fills and submits the sign-in form (the outcome is the caller's to check). */
export async function submitSignIn(page: Page, email: string, password = DEMO_PASSWORD) {
	await page.goto('/signin');
	await page.getByLabel('E-mail').fill(email);
	await page.getByLabel('Password').fill(password);
	await page.getByRole('button', { name: 'Sign in' }).click();
}

/** Signs in with the demo password and waits until the app has left the sign-in page. */
export async function signInPage(page: Page, email: string) {
	await submitSignIn(page, email);
	await expect(page).toHaveURL((url) => !url.pathname.startsWith('/signin'));
}

/** Opens `path` and waits until Svelte has hydrated it (see src/routes/+layout.svelte). */
export async function gotoHydrated(page: Page, path: string) {
	await page.goto(path);
	await expect(page.locator('html[data-hydrated="true"]')).toHaveCount(1);
}

/** An API client holding the session cookie of the given user (or none when email is null). */
export async function apiAs(baseURL: string, email: string | null): Promise<APIRequestContext> {
	const context = await request.newContext({ baseURL, extraHTTPHeaders: { origin: baseURL } });
	if (email) {
		const response = await context.post('/signin', {
			form: { email, password: DEMO_PASSWORD },
			headers: { accept: 'application/json' }
		});
		expect(response.status(), `sign-in of ${email}`).toBe(200);
		expect(await response.json()).toMatchObject({ type: 'redirect' });
	}
	return context;
}

/** The local mail catcher playwright.config.ts starts (scripts/mail-catcher); its JSON API. */
export const MAIL_CATCHER_URL = `http://127.0.0.1:${process.env.MAIL_CATCHER_WEB_PORT ?? '12571'}`;

export interface CaughtMail {
	id: string;
	envelope: { to: string[] };
	subject: string;
	text: string;
	html: string | null;
}

/** Waits until the catcher holds a message to `recipient` that `match` accepts, and returns it. */
export async function caughtMail(
	recipient: string,
	match: (mail: CaughtMail) => boolean,
	timeout = 20_000
): Promise<CaughtMail> {
	let found: CaughtMail | undefined;
	await expect(async () => {
		const all = (await (await fetch(`${MAIL_CATCHER_URL}/messages`)).json()) as CaughtMail[];
		found = all.find((m) => m.envelope.to.includes(recipient) && match(m));
		expect(found, `a message to ${recipient}`).toBeDefined();
	}).toPass({ timeout, intervals: [250, 500, 1000] });
	return found!;
}

/** The first address in a plain-text mail after `label: `. */
export function linkIn(mail: CaughtMail, label: string): string {
	const link = new RegExp(`${label}: (\\S+)`).exec(mail.text)?.[1];
	if (!link) throw new Error(`No "${label}" link in "${mail.subject}"`);
	return link;
}
