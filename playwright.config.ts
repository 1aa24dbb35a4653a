import { defineConfig } from '@playwright/test';

// Drives the built app (node build) in Debian's Chromium; never a downloaded browser.
const PORT = Number(process.env.E2E_PORT ?? 4390);
const baseURL = `http://127.0.0.1:${PORT}`;
// A second app process on the same database (tests/e2e/scaling-out.spec.ts): Landfall keeps no
// state in its processes, so both must behave as one.
const PORT_B = Number(process.env.E2E_PORT_B ?? PORT + 1);
const baseURLB = `http://127.0.0.1:${PORT_B}`;
const chromium = process.env.CHROMIUM_PATH ?? '/usr/lib/chromium/chromium';
// The local Stripe fake the app pays through in these tests (scripts/stripe-fake).
const FAKE_PORT = process.env.STRIPE_FAKE_PORT ?? '12111';
// The local SMTP catcher the app sends its mail to (scripts/mail-catcher); tests read its JSON API.
const SMTP_PORT = process.env.MAIL_CATCHER_SMTP_PORT ?? '12570';
const MAIL_WEB_PORT = process.env.MAIL_CATCHER_WEB_PORT ?? '12571';
const MAIL_CATCHER_URL = `http://127.0.0.1:${MAIL_WEB_PORT}`;
/** fuzz.spec.ts, fuzz-uploads.spec.ts, fuzz-injection.spec.ts */
const FUZZ_SPECS = /\/fuzz(-[a-z]+)?\.spec\.ts$/;
const stripe = {
	STRIPE_SECRET_KEY: 'sk_test_landfall_e2e',
	STRIPE_WEBHOOK_SECRET: 'whsec_landfall_e2e'
};

/** One `node build` of Landfall on its own port, against the test database. */
function appProcess(port: number, origin: string) {
	return {
		command: 'node build',
		url: `${origin}/api/health`,
		timeout: 60_000,
		reuseExistingServer: false,
		stdout: 'pipe' as const,
		env: {
			PORT: String(port),
			HOST: '127.0.0.1',
			ORIGIN: origin,
			BODY_SIZE_LIMIT: '11M',
			DATABASE_URL: process.env.DATABASE_URL ?? '',
			AUTH_SECRET: process.env.AUTH_SECRET ?? '',
			...stripe,
			STRIPE_API_HOST: '127.0.0.1',
			STRIPE_API_PORT: FAKE_PORT,
			STRIPE_API_PROTOCOL: 'http',
			SMTP_HOST: '127.0.0.1',
			SMTP_PORT,
			MAIL_POLL_MS: '300',
			MAIL_RETRY_BASE_MS: '1000'
		}
	};
}

export default defineConfig({
	testDir: 'tests/e2e',
	fullyParallel: false,
	workers: 2,
	retries: 0,
	timeout: 30_000,
	reporter: [['list']],
	use: {
		baseURL,
		trace: 'retain-on-failure',
		screenshot: 'only-on-failure',
		launchOptions: {
			executablePath: chromium,
			args: [
				'--no-sandbox',
				'--disable-gpu',
				'--disable-dev-shm-usage',
				'--disable-quic',
				'--disable-background-networking',
				'--disable-component-update',
				'--disable-sync',
				'--no-first-run',
				'--disable-default-apps'
			]
		}
	},
	// The fuzz specs compare every table before and after each refused request, so they run
	// alone and one at a time, once all other specs have finished (a failure elsewhere skips
	// them; `--project=fuzz --no-deps` runs them by themselves).
	projects: [
		{ name: 'main', testIgnore: FUZZ_SPECS },
		{ name: 'fuzz', testMatch: FUZZ_SPECS, dependencies: ['main'], workers: 1 }
	],
	webServer: [
		{
			command: 'node --import tsx scripts/stripe-fake/main.ts',
			url: `http://127.0.0.1:${FAKE_PORT}/health`,
			timeout: 30_000,
			reuseExistingServer: false,
			stdout: 'pipe',
			env: {
				...stripe,
				STRIPE_FAKE_PORT: FAKE_PORT,
				STRIPE_FAKE_WEBHOOK_URL: `${baseURL}/api/v1/stripe/webhook`,
				STRIPE_FAKE_RETRY_MS: '250'
			}
		},
		{
			command: 'node --import tsx scripts/mail-catcher/main.ts',
			url: `${MAIL_CATCHER_URL}/health`,
			timeout: 30_000,
			reuseExistingServer: false,
			stdout: 'pipe',
			env: { MAIL_CATCHER_SMTP_PORT: SMTP_PORT, MAIL_CATCHER_WEB_PORT: MAIL_WEB_PORT }
		},
		appProcess(PORT, baseURL),
		appProcess(PORT_B, baseURLB)
	]
});
