import { describe, expect, it } from 'vitest';
import { checkoutOrigin, extraPolicy } from './content-security';

describe('content security policy', () => {
	it("lets forms go to Stripe's checkout, or to the local fake when one is configured", () => {
		expect(checkoutOrigin({})).toBe('https://checkout.stripe.com');
		expect(
			checkoutOrigin({
				STRIPE_API_HOST: '127.0.0.1',
				STRIPE_API_PORT: '4312',
				STRIPE_API_PROTOCOL: 'http'
			})
		).toBe('http://127.0.0.1:4312');
		expect(extraPolicy({})).toContain("form-action 'self' https://checkout.stripe.com");
	});
});
