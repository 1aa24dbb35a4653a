/**
 * The part of the Content-Security-Policy that SvelteKit's `kit.csp` (svelte.config.js) does not
 * set, sent as a second policy header. Browsers enforce every policy they receive, so this one
 * can only narrow what the first allows.
 *
 * Why not in kit.csp: a form that pays redirects to the payment page, whose origin depends on
 * the environment (the local fake or Stripe's hosted checkout), and kit.csp is fixed at build
 * time.
 */

/** Where Checkout sends the payer: Stripe's hosted page, or the local fake's own page. */
export function checkoutOrigin(source: Record<string, string | undefined>): string {
	const host = source.STRIPE_API_HOST?.trim();
	if (!host) return 'https://checkout.stripe.com';
	const protocol = source.STRIPE_API_PROTOCOL?.trim() || 'https';
	const port = source.STRIPE_API_PORT?.trim();
	return `${protocol}://${host}${port ? `:${port}` : ''}`;
}

export function extraPolicy(source: Record<string, string | undefined>): string {
	return `form-action 'self' ${checkoutOrigin(source)}`;
}
