import { describe, expect, it } from 'vitest';
import { composeMail } from './layout';
import {
	CUSTOMS_CAUTION,
	depositRequestedMail,
	documentsIssuedMail,
	invitationMail,
	paymentReceivedMail
} from './messages';

const origin = 'http://127.0.0.1:4310';
const hostile = '<script>alert("x")</script> & <img src=x onerror=1>';

describe('mail templates', () => {
	it('escape user data in the HTML part (OWASP XSS Prevention Cheat Sheet, rule #1)', () => {
		const mail = depositRequestedMail({
			origin,
			name: hostile,
			shipmentReference: 'SH-1"><b>',
			amount: 'EUR 1,250.00',
			dueDate: '2026-12-31',
			note: hostile,
			payLink: `${origin}/shipments/x?a=1&b="2"`
		});
		expect(mail.html).not.toContain('<script>');
		expect(mail.html).not.toContain('<img');
		expect(mail.html).not.toContain('"><b>');
		expect(mail.html).toContain('&lt;script&gt;alert(&quot;x&quot;)&lt;/script&gt; &amp;');
		expect(mail.html).toContain('href="http://127.0.0.1:4310/shipments/x?a=1&amp;b=&quot;2&quot;"');
		// The plain-text part carries the words as they are.
		expect(mail.text).toContain(`Note from our team: ${hostile}`);
	});

	it('include the app origin for links and the deposit caution', () => {
		const mail = paymentReceivedMail({
			origin,
			name: 'Ada',
			shipmentReference: 'SH-2026-0001',
			amount: 'EUR 500.00',
			paidOn: '2 Dec 2026',
			paymentReference: 'pi_123',
			receiptLink: `${origin}/deposits/abc/receipt`
		});
		for (const part of [mail.html, mail.text]) {
			expect(part).toContain(`${origin}/deposits/abc/receipt`);
			expect(part).toContain('pi_123');
			expect(part).toContain('EUR 500.00');
			expect(part).toContain('not a final invoice');
		}
		expect(mail.subject).toBe('Receipt: EUR 500.00 received for shipment SH-2026-0001');
	});

	it('invitation names the link and when it expires', () => {
		const mail = invitationMail({
			origin,
			name: 'Bo',
			inviter: 'Admin',
			organization: 'Org',
			role: 'Finance',
			link: `${origin}/set-password/tok`,
			expires: '5 Dec 2026, 10:00 UTC'
		});
		expect(mail.text).toContain(`Choose a password: ${origin}/set-password/tok`);
		expect(mail.html).toContain('5 Dec 2026, 10:00 UTC');
	});

	it('escape the subject in the HTML title', () => {
		const mail = composeMail({ origin, subject: '<b>', heading: 'h', paragraphs: [] });
		expect(mail.html).toContain('<title>&lt;b&gt;</title>');
	});

	it('papers-issued mail defers to a licensed customs broker', () => {
		const mail = documentsIssuedMail({
			origin,
			name: 'Joost',
			shipmentId: 'abc',
			shipmentReference: 'SHP-1',
			documents: ['Commercial invoice CI-2026-00001 rev. A']
		});
		expect(mail.text).toContain(`Please note: ${CUSTOMS_CAUTION}`);
		expect(mail.text).toContain(`${origin}/shipments/abc`);
	});
});
