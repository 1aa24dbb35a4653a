// The catcher's pages: the list and one message. The message's HTML is shown in an iframe with
// an empty sandbox (no scripts, no forms, no same-origin access), its plain text in a <pre>.
import escapeHtml from 'escape-html';
import type { CaughtMessage } from './mailbox';

const e = (value: string) => escapeHtml(value);

function page(title: string, body: string): string {
	return `<!doctype html><html lang="en"><head><meta charset="utf-8"><title>${e(title)}</title>
<style>
body{font-family:system-ui,sans-serif;margin:0;background:#f4f1ea;color:#1f2a2e}
header{background:#1f2a2e;color:#fff;padding:12px 24px}header a{color:#fff}
main{padding:16px 24px;max-width:960px}table{border-collapse:collapse;width:100%;background:#fff}
th,td{text-align:left;padding:8px;border-bottom:1px solid #ddd;vertical-align:top}
a{color:#1d5b4a}iframe{width:100%;height:520px;border:1px solid #ccc;background:#fff}
pre{white-space:pre-wrap;background:#fff;padding:12px;border:1px solid #ccc}
button{font:inherit}
</style></head><body><header><strong>Landfall mail catcher</strong> · nothing here leaves this machine · <a href="/">all messages</a></header><main>${body}</main></body></html>`;
}

export function listPage(messages: CaughtMessage[]): string {
	const rows = messages
		.map(
			(m) =>
				`<tr><td>${e(new Date(m.receivedAt).toISOString().replace('T', ' ').slice(0, 19))} UTC</td><td>${e(m.to)}</td><td><a href="/view/${e(m.id)}">${e(m.subject || '(no subject)')}</a></td></tr>`
		)
		.join('');
	return page(
		'Caught mail',
		`<h1>Caught mail (${messages.length})</h1>
<form method="post" action="/clear"><button type="submit">Delete all</button></form>
<table><thead><tr><th scope="col">Received</th><th scope="col">To</th><th scope="col">Subject</th></tr></thead>
<tbody>${rows || '<tr><td colspan="3">No mail caught yet.</td></tr>'}</tbody></table>`
	);
}

export function messagePage(m: CaughtMessage): string {
	return page(
		m.subject,
		`<h1>${e(m.subject || '(no subject)')}</h1>
<p>From ${e(m.from)} to ${e(m.to)}, received ${e(m.receivedAt)}</p>
${m.html ? `<h2>HTML</h2><iframe sandbox="" title="The message as HTML" srcdoc="${e(m.html)}"></iframe>` : ''}
<h2>Plain text</h2><pre>${e(m.text)}</pre>`
	);
}
