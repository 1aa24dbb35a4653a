import { z } from 'zod';
import { currencyCode } from './fields';

// Requesting a freight deposit: a fixed amount, or a percentage of the chosen mode's freight
// estimate. Shared by the shipment page's form and the services. The minor-unit check (JPY no
// decimals, KWD three) happens in the service, which knows the currency.

export const DEPOSIT_BASES = ['amount', 'percent'] as const;

export const depositRequestSchema = z
	.object({
		basis: z.enum(DEPOSIT_BASES, { error: 'Choose a fixed amount or a percentage.' }),
		amount: z.string().trim().max(20).optional().default(''),
		percent: z.string().trim().max(12).optional().default(''),
		currency: currencyCode,
		dueDate: z.iso.date('Enter the due date as a date (YYYY-MM-DD).'),
		note: z.string().trim().max(500, 'Keep the note to 500 characters.').optional().default('')
	})
	.superRefine((v, ctx) => {
		if (v.basis === 'amount' && !/^\d{1,12}(\.\d{1,3})?$/.test(v.amount))
			ctx.addIssue({
				code: 'custom',
				path: ['amount'],
				message: 'Enter the amount with a dot for decimals, e.g. 1250.00.'
			});
		if (v.basis === 'percent') {
			// Above 0 and at most 100, checked on the text (no float near a charge).
			const ok = /^(100(\.0{1,4})?|\d{1,2}(\.\d{1,4})?)$/.test(v.percent);
			if (!ok || !/[1-9]/.test(v.percent))
				ctx.addIssue({
					code: 'custom',
					path: ['percent'],
					message: 'Enter a percentage above 0 and at most 100, with up to 4 decimals.'
				});
		}
	});
export type DepositRequestInput = z.infer<typeof depositRequestSchema>;

/** Cancel, refund and pay name one deposit; cancel and refund send the version they saw. */
export const depositActionSchema = z.object({
	depositId: z.uuid('That deposit could not be identified.'),
	version: z.coerce.number().int().min(0).optional()
});
