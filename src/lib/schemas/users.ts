import { z } from 'zod';
import { passwordWeakness } from '../password-weakness';
import { ROLES } from '../roles';

// Shared by the admin forms (superforms) and the /api/v1/users endpoints.
export const PASSWORD_RULE =
	'At least 12 and at most 128 characters; not a common or easily guessed one.';

const name = z
	.string()
	.trim()
	.min(1, 'Enter the person’s name.')
	.max(120, 'Keep the name under 120 characters.');
const role = z.enum(ROLES, { error: 'Choose one of the roles.' });
const password = z
	.string()
	.min(12, `Password too short: ${PASSWORD_RULE}`)
	.max(128, `Password too long: ${PASSWORD_RULE}`)
	.superRefine((value, ctx) => {
		// Only once the length is right, so one message at a time.
		const weakness = value.length >= 12 && value.length <= 128 ? passwordWeakness(value) : null;
		if (weakness) ctx.addIssue({ code: 'custom', message: weakness });
	});

export const createUserSchema = z.object({
	name,
	// Trim first, then check the format (z.email().trim() would check before trimming).
	email: z
		.string()
		.trim()
		.max(254, 'That address is too long.')
		.pipe(z.email({ error: 'Enter an e-mail address such as name@company.example.' })),
	role,
	organizationId: z.uuid({ error: 'Choose the organization this person belongs to.' }),
	password
});
export type CreateUserInput = z.infer<typeof createUserSchema>;

/** Adding a person by e-mail: they choose their own password through the invitation link. */
export const inviteUserSchema = createUserSchema.omit({ password: true });

/** The invitation's set-password form. */
export const setPasswordSchema = z
	.object({ password, confirm: z.string() })
	.refine((v) => v.password === v.confirm, {
		path: ['confirm'],
		message: 'The two passwords differ: type the same one twice.'
	});

export const updateUserSchema = z.object({
	name,
	role,
	disabled: z.boolean().default(false),
	/** The version the editor saw; a mismatch means someone else saved first. */
	version: z.number().int().min(0)
});
export type UpdateUserInput = z.infer<typeof updateUserSchema>;
