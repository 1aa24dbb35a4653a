// The fake's own hosted payment page: plain HTML, its own look, nothing of any real product.
import { formatMinor } from '../../src/lib/deposits/minor-units';
import type { CheckoutSession } from './objects';

const escape = (s: string) =>
	s.replace(
		/[&<>"']/g,
		(c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' })[c]!
	);

export interface PageState {
	session: CheckoutSession;
	description: string;
	notice?: { tone: 'error' | 'info'; text: string };
	card?: string;
}

export function payPage({ session, description, notice, card }: PageState): string {
	const amount = formatMinor(session.amount_total, session.currency.toUpperCase());
	const open = session.status === 'open';
	const form = open
		? `<form method="post" action="/pay/${escape(session.id)}" novalidate>
	<label>Card number <input name="card" inputmode="numeric" autocomplete="off" value="${escape(card ?? '')}" required></label>
	<div class="row">
		<label>Expiry (MM/YY) <input name="expiry" autocomplete="off" placeholder="12/30" required></label>
		<label>Security code <input name="cvc" inputmode="numeric" autocomplete="off" required></label>
	</div>
	<button type="submit">Pay ${escape(amount)}</button>
</form>
<p class="cards">Test cards: <code>4242 4242 4242 4242</code> is accepted, <code>4000 0000 0000 0002</code> is declined. Any future expiry and any three digits.</p>
${session.cancel_url ? `<p><a href="${escape(session.cancel_url)}">Go back without paying</a></p>` : ''}`
		: `<p>This payment session is ${session.status === 'complete' ? 'already paid' : 'no longer open'}.</p>`;
	return `<!doctype html>
<html lang="en"><head><meta charset="utf-8"><meta name="viewport" content="width=device-width, initial-scale=1">
<title>Test payment page</title>
<style>
body{font:16px/1.5 system-ui,sans-serif;background:#eef3f1;color:#1d2b27;margin:0;padding:2rem 1rem}
main{max-width:28rem;margin:auto;background:#fff;border:2px solid #1d2b27;padding:1.5rem}
h1{font-size:1.25rem;margin:0 0 .25rem}.amount{font-size:1.75rem;font-weight:700;margin:.5rem 0}
label{display:block;margin:.75rem 0;font-weight:600}input{display:block;width:100%;box-sizing:border-box;padding:.5rem;font:inherit;border:1px solid #50605b}
.row{display:grid;grid-template-columns:1fr 1fr;gap:.75rem}button{margin-top:1rem;width:100%;padding:.75rem;font:inherit;font-weight:700;background:#1d5c4b;color:#fff;border:0;cursor:pointer}
.notice{padding:.75rem;border-left:4px solid}.error{background:#fdecea;border-color:#a4262c}.info{background:#e8f1fb;border-color:#2a5d9f}
.cards{font-size:.875rem;color:#50605b}.tag{display:inline-block;font-size:.75rem;font-weight:700;letter-spacing:.05em;text-transform:uppercase;background:#f4d35e;padding:.1rem .4rem}
</style></head>
<body><main>
<span class="tag">Test mode</span>
<h1>Test payment page</h1>
<p>No real money moves here. This page stands in for a card payment page while testing.</p>
<p>${escape(description)}</p>
<p class="amount">${escape(amount)}</p>
${notice ? `<p class="notice ${notice.tone}" role="${notice.tone === 'error' ? 'alert' : 'status'}">${escape(notice.text)}</p>` : ''}
${form}
</main></body></html>`;
}
