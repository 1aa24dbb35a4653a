/**
 * The page a browser gets while PostgreSQL is unreachable (503). It needs nothing from the
 * database or the build: styles inline in Landfall's palette (tailwind.config.ts), the mark from
 * static/favicon.svg, and a link that tries the same address again. No script, so no CSP nonce.
 */
const MARK = `<svg aria-hidden="true" width="32" height="32" viewBox="0 0 32 32"><rect width="32" height="32" rx="7" fill="#1b5139"/><path d="M5 21c3.5-2.2 7-2.2 10.5 0s7 2.2 10.5 0" fill="none" stroke="#fbfaf6" stroke-width="2.4" stroke-linecap="round"/><path d="M16 6l5 9H11z" fill="#c8551f"/></svg>`;

const STYLE = `
body{margin:0;min-height:100vh;display:grid;place-items:center;background:#fbfaf6;color:#161c1b;
font:16px/1.5 "Roboto Flex",system-ui,sans-serif}
main{max-width:34rem;margin:2rem;padding:2rem;background:#fff;border:1px solid #e9e2d2;border-radius:12px;
box-shadow:0 1px 2px rgba(22,28,27,.06)}
.brand{display:flex;align-items:center;gap:.6rem;font-weight:700;font-size:1.15rem;margin-bottom:1.5rem}
h1{font-size:1.5rem;line-height:1.25;margin:0 0 .75rem}
p{margin:0 0 1rem;color:#343d3b}
a.retry{display:inline-block;padding:.5rem 1rem;border-radius:6px;background:#236649;color:#fff;
font-weight:600;text-decoration:none}
a.retry:hover{background:#1b5139}
a.retry:focus-visible{outline:2px solid #c8551f;outline-offset:2px}
small{display:block;margin-top:1.25rem;color:#5e6866}`;

const escape = (s: string) => s.replace(/[&<>"']/g, (c) => `&#${c.charCodeAt(0)};`);

/** The whole HTML document; `retryPath` is the address asked for (path and query). */
export function outagePage(message: string, retryAfterSeconds: number, retryPath: string): string {
	return `<!doctype html><html lang="en"><head><meta charset="utf-8">
<meta name="viewport" content="width=device-width, initial-scale=1">
<title>Landfall: back in a moment</title><style>${STYLE}</style></head>
<body><main>
<div class="brand">${MARK}<span>Landfall</span></div>
<h1>Back in a moment</h1>
<p>${escape(message)}</p>
<p>This usually passes within seconds. What you saved before this page appeared is safe.</p>
<a class="retry" href="${escape(retryPath)}">Try again</a>
<small>Suggested wait: ${retryAfterSeconds} seconds. If this page stays, tell your Landfall administrator.</small>
</main></body></html>`;
}
