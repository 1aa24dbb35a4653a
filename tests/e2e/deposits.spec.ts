import AxeBuilder from '@axe-core/playwright';
import { expect, test, type Browser, type Page } from '@playwright/test';
import {
	DEMO,
	DEMO_PASSWORD,
	apiAs,
	caughtMail,
	gotoHydrated,
	linkIn,
	signInPage
} from './helpers';

// Freight deposits with the local Stripe fake (started by playwright.config.ts): finance asks
// Hallvik for a deposit; Hallvik's buyer pays on the fake's test payment page and comes back;
// the deposit shows paid once the fake's webhook has reached Landfall. A declined card leaves
// it unpaid. Test cards as the fake documents them (Stripe's test card numbers).

let shipmentId = '';

test.beforeAll(async ({ baseURL }) => {
	const api = await apiAs(baseURL!, DEMO.broker);
	const list = await (await api.get('/api/v1/shipments?pageSize=100')).json();
	shipmentId = list.rows.find((r: { customerName: string }) =>
		r.customerName.startsWith('Hallvik')
	).id;
	await api.dispose();
});

/** Finance requests a fixed-amount deposit with a note that tells this test's row apart. */
async function requestDeposit(browser: Browser, amount: string, note: string) {
	const context = await browser.newContext();
	const page = await context.newPage();
	await signInPage(page, DEMO.finance);
	await gotoHydrated(page, `/shipments/${shipmentId}`);
	const panel = page.getByRole('region', { name: 'Freight deposits' });
	await panel.getByLabel('A fixed amount').check();
	await panel.getByLabel('Amount', { exact: true }).fill(amount);
	await panel.getByLabel('Note to the customer').fill(note);
	await panel.getByRole('button', { name: 'Request deposit' }).click();
	await expect(panel.getByText(/Deposit of [A-Z]{3} [\d,.]+ requested\./)).toBeVisible();
	await expect(panel.getByRole('row').filter({ hasText: note })).toContainText('Requested');
	await context.close();
}

/** The buyer's row of that deposit on the shipment page. */
async function buyerRow(page: Page, note: string) {
	await gotoHydrated(page, `/shipments/${shipmentId}`);
	return page
		.getByRole('table', { name: 'Freight deposits' })
		.getByRole('row')
		.filter({ hasText: note });
}

async function fillCard(page: Page, card: string) {
	await expect(page.getByRole('heading', { name: 'Test payment page' })).toBeVisible();
	await page.getByLabel('Card number').fill(card);
	await page.getByLabel('Expiry (MM/YY)').fill('12/30');
	await page.getByLabel('Security code').fill('123');
	await page.getByRole('button', { name: /^Pay / }).click();
}

test('finance requests a deposit; the customer pays by card and sees it paid after the webhook', async ({
	browser,
	page
}) => {
	const note = `E2E deposit ${Date.now()}`;
	await requestDeposit(browser, '640.00', note);

	await signInPage(page, DEMO.customer);
	const row = await buyerRow(page, note);
	await expect(row).toContainText('640.00');
	await row.getByRole('button', { name: /^Pay / }).click();
	await expect(page).toHaveURL(/127\.0\.0\.1:\d+\/pay\/cs_test_/);
	await expect(page.getByText(/640\.00/).first()).toBeVisible();
	await fillCard(page, '4242 4242 4242 4242');

	await expect(page).toHaveURL(new RegExp(`/shipments/${shipmentId}/deposits/[0-9a-f-]{36}/paid`));
	await expect(page.getByRole('heading', { name: 'Thank you' })).toBeVisible();
	await expect(
		page.getByText(/We will confirm when the payment is received|The payment has been received/)
	).toBeVisible();
	// The webhook decides: look again until it has arrived.
	await expect(async () => {
		await page.reload();
		await expect(page.getByText('The payment has been received.')).toBeVisible({ timeout: 1000 });
	}).toPass({ timeout: 20_000 });

	const paidRow = await buyerRow(page, note);
	await expect(paidRow).toContainText('Paid');
	await expect(paidRow).toContainText('Received');
	await expect(paidRow.getByRole('button', { name: /^Pay / })).toHaveCount(0);
});

test('a declined card shows a clear message and leaves the deposit unpaid', async ({
	browser,
	page
}) => {
	const note = `E2E declined ${Date.now()}`;
	await requestDeposit(browser, '95.50', note);

	await signInPage(page, DEMO.customer);
	const row = await buyerRow(page, note);
	await row.getByRole('button', { name: /^Pay / }).click();
	await fillCard(page, '4000 0000 0000 0002');
	await expect(page.getByRole('alert')).toHaveText(/The card was declined/);
	await expect(page).toHaveURL(/\/pay\/cs_test_/);

	await page.getByRole('link', { name: 'Go back without paying' }).click();
	await expect(page.getByRole('heading', { name: 'No payment was made' })).toBeVisible();
	await expect(page.getByText('We will confirm when the payment is received.')).toBeVisible();

	await expect(async () => {
		const again = await buyerRow(page, note);
		await expect(again).toContainText('Your card was declined.', { timeout: 1000 });
	}).toPass({ timeout: 20_000 });
	const unpaid = await buyerRow(page, note);
	await expect(unpaid).toContainText('Requested');
	await expect(unpaid.getByRole('button', { name: /^Pay / })).toBeVisible();
});

test('the deposit request arrives by e-mail; its link leads to payment, and the receipt follows by e-mail', async ({
	browser,
	page
}) => {
	const note = `E2E mailed ${Date.now()}`;
	await requestDeposit(browser, '715.00', note);

	// The request notice, read from the mail catcher.
	const request = await caughtMail(DEMO.customer, (m) => m.text.includes(note));
	expect(request.subject).toMatch(/^Freight deposit of [A-Z]{3} 715\.00 for shipment /);
	expect(request.text).toContain('not a final invoice');
	const payLink = linkIn(request, 'Pay the deposit');
	expect(payLink).toContain(`/shipments/${shipmentId}`);

	// Following it signs the customer in first, then lands on the shipment.
	await gotoHydrated(page, payLink);
	await expect(page).toHaveURL(/\/signin/);
	await page.getByLabel('E-mail').fill(DEMO.customer);
	await page.getByLabel('Password').fill(DEMO_PASSWORD);
	await page.getByRole('button', { name: 'Sign in' }).click();
	await expect(page).toHaveURL(new RegExp(`/shipments/${shipmentId}`));
	const row = page
		.getByRole('table', { name: 'Freight deposits' })
		.getByRole('row')
		.filter({ hasText: note });
	await row.getByRole('button', { name: /^Pay / }).click();
	await fillCard(page, '4242 4242 4242 4242');
	await expect(page.getByRole('heading', { name: 'Thank you' })).toBeVisible();
	await expect(async () => {
		await page.reload();
		await expect(page.getByText('The payment has been received.')).toBeVisible({ timeout: 1000 });
	}).toPass({ timeout: 20_000 });

	// The receipt e-mail, once the webhook has marked the deposit paid.
	const receipt = await caughtMail(
		DEMO.customer,
		(m) =>
			/^Receipt: [A-Z]{3} 715\.00 /.test(m.subject) && m.text.includes(`/shipments/${shipmentId}/`)
	);
	expect(receipt.text).toMatch(/Payment reference: pi_\w+/);
	await gotoHydrated(page, linkIn(receipt, 'View the receipt'));
	await expect(page.getByRole('heading', { name: 'Receipt' })).toBeVisible();
	await expect(page.getByTestId('receipt-amount')).toHaveText(/^[A-Z]{3} 715\.00$/);
	await expect(page.getByTestId('receipt-reference')).toHaveText(/^pi_/);
	// WCAG 2.1 A/AA through axe, as in accessibility.spec.ts: nothing serious or critical.
	const axe = await new AxeBuilder({ page })
		.withTags(['wcag2a', 'wcag2aa', 'wcag21a', 'wcag21aa'])
		.analyze();
	expect(axe.violations.filter((v) => v.impact === 'serious' || v.impact === 'critical')).toEqual(
		[]
	);

	// The panel links the receipt too.
	const paidRow = await buyerRow(page, note);
	await expect(paidRow.getByRole('link', { name: /Receipt/ })).toBeVisible();
});
