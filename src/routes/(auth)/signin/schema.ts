import { z } from 'zod';

export const signInSchema = z.object({
	email: z
		.email({ error: 'Enter your e-mail address, e.g. name@company.example.' })
		.trim()
		.max(254),
	password: z.string().min(1, 'Enter your password.').max(128, 'That password is too long.')
});
