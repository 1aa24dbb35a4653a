import { hash, verify } from '@node-rs/argon2';

// argon2id with the OWASP Password Storage Cheat Sheet's baseline (19 MiB, 2 passes, 1 lane).
// `algorithm: 2` is Algorithm.Argon2id (a const enum, which isolated modules cannot import).
const OPTIONS = { algorithm: 2, memoryCost: 19_456, timeCost: 2, parallelism: 1 } as const;

export const PASSWORD_MIN_LENGTH = 12;
export const PASSWORD_MAX_LENGTH = 128;

export function hashPassword(password: string): Promise<string> {
	return hash(password, OPTIONS);
}

export async function verifyPassword(passwordHash: string, password: string): Promise<boolean> {
	try {
		return await verify(passwordHash, password);
	} catch {
		return false; // a malformed stored hash never signs anyone in
	}
}

let dummyHash: Promise<string> | undefined;

/** Spend the same time on an unknown e-mail as on a wrong password, so timing tells nothing. */
export async function verifyAgainstDummy(password: string): Promise<false> {
	dummyHash ??= hashPassword('landfall-timing-equaliser');
	await verifyPassword(await dummyHash, password);
	return false;
}
