import { describe, expect, it } from 'vitest';
import { passwordWeakness } from './password-weakness';

// NIST SP 800-63B (2017, rev. 3) §5.1.1.2: refuse commonly used, repetitive or sequential and
// context-specific choices; its own examples are 'aaaaaa' and '1234abcd'.
describe('passwordWeakness', () => {
	it('refuses repetitive and sequential choices', () => {
		expect(passwordWeakness('aaaaaaaaaaaa')).toMatch(/different characters/);
		expect(passwordWeakness('abababababab')).toMatch(/different characters/);
		expect(passwordWeakness('abcdefghijklm')).toMatch(/consecutive/);
		expect(passwordWeakness('987654321098')).toMatch(/consecutive/);
	});

	it('refuses common passwords and the service name with digits', () => {
		expect(passwordWeakness('Password1234')).toMatch(/common passwords/);
		expect(passwordWeakness('Landfall2026!!')).toMatch(/words of your own/);
		expect(passwordWeakness('password-landfall-99')).toMatch(/words of your own/);
	});

	it('accepts passphrases and random strings', () => {
		expect(passwordWeakness('A-long-enough-password')).toBeNull();
		expect(passwordWeakness('harbour crane at dusk')).toBeNull();
		expect(passwordWeakness('q7#Vm2!xR9pL')).toBeNull();
		expect(passwordWeakness('Landfall-demo-2026')).toBeNull(); // the demo's: 'demo' is its own word
	});
});
