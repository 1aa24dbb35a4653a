import { signatureHeader } from '../../scripts/stripe-fake/webhooks';

/** The webhook secret playwright.config.ts gives the app processes. */
const WEBHOOK_SECRET = 'whsec_landfall_e2e';

/** Delivers a payload to an app process's Stripe webhook, signed as Stripe would sign it. */
export function deliverSigned(base: string, payload: string): Promise<Response> {
	return fetch(`${base}/api/v1/stripe/webhook`, {
		method: 'POST',
		headers: {
			'content-type': 'application/json',
			'stripe-signature': signatureHeader(payload, WEBHOOK_SECRET, Math.floor(Date.now() / 1000))
		},
		body: payload
	});
}
