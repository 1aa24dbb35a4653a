/**
 * What an uploaded supporting document may be: a PDF, PNG or JPEG, recognised by its first bytes
 * (the "magic numbers" each format's specification puts at the start of a file), never by its
 * name or the browser's declared type. At most 10 MiB (10 × 1024 × 1024 bytes).
 *
 * Signatures: PDF "%PDF-" (ISO 32000-2:2020, 7.5.2, file header); PNG 89 50 4E 47 0D 0A 1A 0A
 * (ISO/IEC 15948:2004 / W3C PNG, 5.2, PNG signature); JPEG FF D8 FF, a start-of-image marker
 * followed by the next marker (ITU-T T.81 (1992), B.1.1.3 and B.2.1). Section numbers from
 * memory.
 *
 * Pure module: no framework imports.
 */

export const MAX_UPLOAD_BYTES = 10 * 1024 * 1024;

export type UploadType = 'application/pdf' | 'image/png' | 'image/jpeg';

export const UPLOAD_EXTENSIONS: Readonly<Record<UploadType, string>> = Object.freeze({
	'application/pdf': 'pdf',
	'image/png': 'png',
	'image/jpeg': 'jpg'
});

const PNG = [0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a];
const PDF = [0x25, 0x50, 0x44, 0x46, 0x2d]; // "%PDF-"
const JPEG = [0xff, 0xd8, 0xff];

const startsWith = (bytes: Uint8Array, sig: readonly number[], at = 0) =>
	bytes.length >= at + sig.length && sig.every((b, i) => bytes[at + i] === b);

/**
 * The type the bytes are, or null. The signature must be at the very start. Acrobat accepts a
 * "%PDF-" header anywhere in the first 1024 bytes (PDF Reference 1.7, Appendix H; from memory),
 * but then an HTML page or a script with a PDF header a few lines in would pass, so Landfall
 * asks for it at byte 0, where PDF writers put it. Everything else — executables (MZ, ELF),
 * archives (ZIP), HTML, SVG, text — is refused.
 */
export function detectUploadType(bytes: Uint8Array): UploadType | null {
	if (startsWith(bytes, PNG)) return 'image/png';
	if (startsWith(bytes, JPEG)) return 'image/jpeg';
	if (startsWith(bytes, PDF)) return 'application/pdf';
	return null;
}

/** Characters no file name keeps: path separators, Windows-reserved, control characters. */
// eslint-disable-next-line no-control-regex -- removing control characters is the point
const RESERVED = /[<>:"/\\|?*\u0000-\u001f\u007f-\u009f]/g;
/** Bidirectional overrides and zero-width characters: "a\u202Efdp.exe" would show as "aexe.pdf". */
const INVISIBLE = /[\u200b-\u200f\u202a-\u202e\u2060-\u2069\ufeff]/g;
/** Device names Windows will not open as files, with or without an extension. */
const WINDOWS_DEVICE = /^(con|prn|aux|nul|com\d|lpt\d)$/i;

export const MAX_FILE_NAME_LENGTH = 120;

/**
 * A file name safe to store and to send back in Content-Disposition: no folders (anything up to
 * the last / or \ is dropped), no control, reserved or invisible characters, no leading dots, at
 * most 120 characters, and the extension of the type the content really is (the name's own
 * extension is dropped when it is 1–5 letters or digits). A name is cleaned, never a reason to
 * refuse a file.
 */
export function sanitizeFileName(name: string, type: UploadType): string {
	const base = name.split(/[/\\]/).pop() ?? '';
	const cleaned = base
		.normalize('NFC')
		.replace(RESERVED, '')
		.replace(INVISIBLE, '')
		.replace(/\s+/g, ' ')
		.trim()
		.replace(/^[.\s]+/, '');
	let stem = cleaned.replace(/\.[A-Za-z0-9]{1,5}$/, '').replace(/[.\s]+$/, '') || 'document';
	if (WINDOWS_DEVICE.test(stem)) stem = `${stem}-file`;
	const ext = `.${UPLOAD_EXTENSIONS[type]}`;
	return `${[...stem]
		.slice(0, MAX_FILE_NAME_LENGTH - ext.length)
		.join('')
		.trim()}${ext}`;
}

export type UploadCheck =
	{ ok: true; type: UploadType; fileName: string; size: number } | { ok: false; message: string };

const MIB = 1024 * 1024;

/** "The file is 11.0 MB; …", or "over 10 MB" when one decimal would round it down to 10.0. */
export function tooLargeMessage(size: number): string {
	const mb = (size / MIB).toFixed(1);
	const limit = MAX_UPLOAD_BYTES / MIB;
	return `The file is ${Number(mb) > limit ? `${mb} MB` : `over ${limit} MB`}; at most ${limit} MB is accepted.`;
}

export interface UploadCandidate {
	/** The name the browser sent; only cleaned and kept for display and download. */
	name: string;
	bytes: Uint8Array;
	/** The browser's declared type: ignored on purpose (it is whatever the sender says). */
	declaredType?: string;
}

/** Checks an upload's size and content; the message is written for the form's file field. */
export function checkUpload({ name, bytes }: UploadCandidate): UploadCheck {
	if (bytes.length === 0) return { ok: false, message: 'The file is empty.' };
	if (bytes.length > MAX_UPLOAD_BYTES) return { ok: false, message: tooLargeMessage(bytes.length) };
	const type = detectUploadType(bytes);
	if (!type)
		return {
			ok: false,
			message: 'Only PDF, PNG or JPEG files are accepted, and this file is none of them.'
		};
	return { ok: true, type, fileName: sanitizeFileName(name, type), size: bytes.length };
}
