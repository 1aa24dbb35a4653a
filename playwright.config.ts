import { defineConfig } from '@playwright/test';

// Drives the built app (node build) in Debian's Chromium; never a downloaded browser.
const PORT = Number(process.env.E2E_PORT ?? 4390);
const baseURL = `http://127.0.0.1:${PORT}`;
const chromium = process.env.CHROMIUM_PATH ?? '/usr/lib/chromium/chromium';

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
	webServer: {
		command: 'node build',
		url: `${baseURL}/api/health`,
		timeout: 60_000,
		reuseExistingServer: false,
		stdout: 'pipe',
		env: {
			PORT: String(PORT),
			HOST: '127.0.0.1',
			ORIGIN: baseURL,
			DATABASE_URL: process.env.DATABASE_URL ?? '',
			AUTH_SECRET: process.env.AUTH_SECRET ?? ''
		}
	}
});
