// Secrets come only from the environment: no tracked file holds a live payment key, a private key,
// a cloud access key or a .env file. Test keys of the local fakes (sk_test_landfall_…,
// whsec_landfall_…) and the test suite's AUTH_SECRET are not secrets and are allowed.
import { execFileSync } from 'node:child_process';
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';

const tracked = execFileSync('git', ['ls-files', '-z'], { encoding: 'utf8' })
	.split('\0')
	.filter(Boolean);

// Key formats: Stripe API keys docs ("sk_live_", "rk_live_", "whsec_"); PEM, RFC 7468 §2;
// AWS access key ids "AKIA" + 16 (AWS IAM User Guide, "Unique identifiers"). Checked 2026.
const PATTERNS: [string, RegExp][] = [
	['a live Stripe key', /\b[sr]k_live_[0-9A-Za-z]{8,}/],
	['a Stripe webhook secret other than the fakes’', /\bwhsec_(?!landfall_)[0-9A-Za-z]{16,}/],
	['a private key', /-----BEGIN (?:RSA |EC |OPENSSH |ENCRYPTED )?PRIVATE KEY-----/],
	['an AWS access key id', /\bAKIA[0-9A-Z]{16}\b/],
	[
		'an SMTP or database password in a URL',
		/\b(?:smtps?|postgres(?:ql)?):\/\/[^\s:@/]+:[^\s@/]{6,}@/
	]
];

describe('the repository', () => {
	it('tracks no .env file (only .env.example)', () => {
		expect(
			tracked.filter((f) => /(^|\/)\.env(\.|$)/.test(f) && !f.endsWith('.env.example'))
		).toEqual([]);
	});

	it('holds no secret in any tracked text file', () => {
		const found: string[] = [];
		for (const file of tracked) {
			if (file === 'tests/integration/repository-secrets.test.ts') continue; // the patterns
			let text: string;
			try {
				text = readFileSync(file, 'utf8');
			} catch {
				continue; // removed in the working tree
			}
			if (text.includes('\0')) continue; // binary
			for (const [what, pattern] of PATTERNS)
				if (pattern.test(text)) found.push(`${file}: ${what}`);
		}
		expect(found).toEqual([]);
	});
});
