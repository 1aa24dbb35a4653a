/**
 * The frame every Landfall e-mail shares: a heading, paragraphs, an optional button, an optional
 * caution, and the same again as plain text. Pure: no framework imports. Every value is escaped
 * here, so user data (names, notes, references) can never add markup.
 */
import escapeHtml from 'escape-html';

export interface MailContent {
	subject: string;
	html: string;
	text: string;
}

export interface MailParts {
	subject: string;
	heading: string;
	greeting?: string;
	paragraphs: string[];
	/** Label: value lines, e.g. Amount: EUR 1,250.00. */
	facts?: [string, string][];
	action?: { label: string; href: string };
	caution?: string;
	/** The app's ORIGIN, named in the footer. */
	origin: string;
}

const FONT = "font-family: 'Roboto Flex', Arial, sans-serif";

export function composeMail(parts: MailParts): MailContent {
	const e = escapeHtml;
	const facts = parts.facts ?? [];
	const html = [
		'<!doctype html><html lang="en"><head><meta charset="utf-8">',
		`<title>${e(parts.subject)}</title></head>`,
		`<body style="margin:0;padding:24px;background:#f4f1ea;${FONT};color:#1f2a2e">`,
		'<div style="max-width:560px;margin:0 auto;background:#ffffff;border-radius:8px;padding:24px">',
		'<p style="margin:0 0 16px;font-weight:700;letter-spacing:.08em;color:#2f6b5a">LANDFALL</p>',
		`<h1 style="font-size:20px;margin:0 0 16px">${e(parts.heading)}</h1>`,
		parts.greeting ? `<p>${e(parts.greeting)}</p>` : '',
		...parts.paragraphs.map((p) => `<p>${e(p)}</p>`),
		facts.length
			? `<table style="border-collapse:collapse;margin:12px 0">${facts
					.map(
						([k, v]) =>
							`<tr><th scope="row" style="text-align:left;padding:4px 12px 4px 0;color:#4b5a5f">${e(k)}</th><td style="padding:4px 0">${e(v)}</td></tr>`
					)
					.join('')}</table>`
			: '',
		parts.action
			? `<p style="margin:20px 0"><a href="${e(parts.action.href)}" style="background:#2f6b5a;color:#ffffff;padding:10px 18px;border-radius:6px;text-decoration:none">${e(parts.action.label)}</a></p><p style="font-size:13px;color:#4b5a5f">Or open this address: ${e(parts.action.href)}</p>`
			: '',
		parts.caution
			? `<p style="border-left:4px solid #b7791f;padding:8px 12px;background:#fdf6e7;font-size:13px"><strong>Please note:</strong> ${e(parts.caution)}</p>`
			: '',
		`<p style="font-size:12px;color:#4b5a5f;margin-top:24px">Sent by Landfall at ${e(parts.origin)}. You receive this because you have a Landfall sign-in.</p>`,
		'</div></body></html>'
	].join('');
	const text = [
		parts.heading,
		'',
		...(parts.greeting ? [parts.greeting, ''] : []),
		...parts.paragraphs.flatMap((p) => [p, '']),
		...(facts.length ? [...facts.map(([k, v]) => `${k}: ${v}`), ''] : []),
		...(parts.action ? [`${parts.action.label}: ${parts.action.href}`, ''] : []),
		...(parts.caution ? [`Please note: ${parts.caution}`, ''] : []),
		`Sent by Landfall at ${parts.origin}. You receive this because you have a Landfall sign-in.`
	].join('\n');
	return { subject: parts.subject, html, text };
}

/** An absolute link into the app: ORIGIN without a trailing slash, then the path. */
export function appLink(origin: string, path: string): string {
	return origin.replace(/\/+$/, '') + path;
}
