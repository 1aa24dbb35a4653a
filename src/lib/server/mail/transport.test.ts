import { describe, expect, it } from 'vitest';
import { MailNotConfigured, smtpConfigFrom } from './transport';

describe('smtpConfigFrom', () => {
	it('defaults to the local catcher on 127.0.0.1:4325, no TLS, no login', () => {
		expect(smtpConfigFrom({})).toEqual({
			host: '127.0.0.1',
			port: 4325,
			secure: false,
			user: undefined,
			pass: undefined,
			from: 'Landfall <landfall@solvrae.example>'
		});
	});

	it('reads a real server from the environment', () => {
		const config = smtpConfigFrom({
			SMTP_HOST: 'smtp.example.com',
			SMTP_PORT: '465',
			SMTP_SECURE: 'true',
			SMTP_USER: 'landfall',
			SMTP_PASS: 'secret',
			MAIL_FROM: 'Exports <exports@example.com>'
		});
		expect(config).toMatchObject({ host: 'smtp.example.com', port: 465, secure: true });
		expect(config.from).toBe('Exports <exports@example.com>');
	});

	it('names what is wrong', () => {
		expect(() => smtpConfigFrom({ SMTP_PORT: 'abc' })).toThrow(MailNotConfigured);
		expect(() => smtpConfigFrom({ SMTP_SECURE: 'yes' })).toThrow(
			'SMTP_SECURE must be true or false.'
		);
		expect(() => smtpConfigFrom({ SMTP_USER: 'a' })).toThrow('Set both SMTP_USER and SMTP_PASS');
	});
});
