import { z } from 'zod';

export const signInSchema = z.object({
	// Trim first, then check the format.
	email: z
		.string()
		.trim()
		.max(254, 'That address is too long.')
		.pipe(z.email({ error: 'Enter your e-mail address, e.g. name@company.example.' })),
	password: z.string().min(1, 'Enter your password.').max(128, 'That password is too long.')
});
