// Passwords people pick first and attackers try first. NIST SP 800-63B (2017, rev. 3) §5.1.1.2
// asks that a new password be checked against "commonly-used, expected, or compromised" values,
// naming "repetitive or sequential characters (e.g. 'aaaaaa', '1234abcd')" and context-specific
// words such as the name of the service. Length (12–128) is checked by the schema itself.

/** Well-known choices of 12 characters or more (from memory: the lists published after breaches). */
const COMMON = new Set([
	'123456789012',
	'1234567890123',
	'qwertyuiopas',
	'qwerty123456',
	'1q2w3e4r5t6y',
	'1qaz2wsx3edc',
	'iloveyou1234',
	'passwordpassword',
	'password1234',
	'password12345',
	'welcome12345',
	'letmeinletmein',
	'abc123abc123',
	'changeme1234',
	'administrator'
]);

/** Words a Landfall password should not be built on alone: the service and its trade. */
const CONTEXT = ['landfall', 'password', 'qwerty', 'shipment', 'freight'];

/** Why the password is too easy to guess, or null when it is not one of the usual weak choices. */
export function passwordWeakness(password: string): string | null {
	const lower = password.toLowerCase();
	if (COMMON.has(lower)) return 'This password is on lists of common passwords: choose another.';
	if (new Set(lower).size <= 3) return 'Use more different characters than that.';
	if (isSequence(lower)) return 'A run of consecutive characters is easy to guess.';
	const rest = CONTEXT.reduce((text, word) => text.split(word).join(''), lower);
	if (rest.replace(/[^a-z]/g, '').length < 4)
		return 'Add words of your own: this is a common word with digits or symbols.';
	return null;
}

/** Every character one step after (or before) the last, like 'abcdefghijkl' or '987654321098'. */
function isSequence(text: string): boolean {
	const codes = [...text].map((c) => c.codePointAt(0)!);
	const steps = codes.slice(1).map((c, i) => c - codes[i]!);
	const ok = (s: number) => s === 1 || s === -9; // '9' → '0' wraps in digit runs
	const down = (s: number) => s === -1 || s === 9;
	return steps.every(ok) || steps.every(down);
}
