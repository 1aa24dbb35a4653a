/**
 * What an uploaded supporting document may be: a PDF, PNG or JPEG, recognised by its first bytes
 * (the "magic numbers" each format's specification puts at the start of a file), never by its
 * name or the browser's declared type. At most 10 MiB.
 *
 * Signatures: PDF "%PDF-" (ISO 32000-2:2020, 7.5.2, file header); PNG 89 50 4E 47 0D 0A 1A 0A
 * (ISO/IEC 15948:2004 / W3C PNG, 5.2, PNG signature); JPEG FF D8 FF, a start-of-image marker
 * followed by the next marker (ITU-T T.81 (1992), B.1.1.3 and B.2.1).
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
 * The type the bytes are, or null. A PDF header may follow up to 1024 bytes of other data
 * (ISO 32000-2, 7.5.2, note; readers accept it), so it is looked for within the first KiB.
 */
export function detectUploadType(bytes: Uint8Array): UploadType | null {
	if (startsWith(bytes, PNG)) return 'image/png';
	if (startsWith(bytes, JPEG)) return 'image/jpeg';
	if (startsWith(bytes, PDF)) return 'application/pdf';
	// Executables and archives are refused outright, even if "%PDF-" appears later on.
	if (startsWith(bytes, [0x4d, 0x5a]) || startsWith(bytes, [0x7f, 0x45, 0x4c, 0x46])) return null;
	if (startsWith(bytes, [0x50, 0x4b, 0x03, 0x04])) return null;
	const head = bytes.subarray(0, 1024);
	for (let i = 1; i + PDF.length <= head.length; i++)
		if (startsWith(head, PDF, i)) return 'application/pdf';
	return null;
}

/** Why a name could not be kept whole is no reason to refuse: it is cleaned instead. */
const RESERVED = /[<>:"/\\|?*\u0000-\u001f\u007f]/g;

/**
 * A file name safe to store and to send back in Content-Disposition: no folders (anything up to
 * the last / or \ is dropped), no control or reserved characters, no leading dots, at most 120
 * characters, and the extension of the type the content really is.
 */
export function sanitizeFileName(name: string, type: UploadType): string {
	const base = name.split(/[/\\]/).pop() ?? '';
	const cleaned = base
		.normalize('NFC')
		.replace(RESERVED, '')
		.replace(/\s+/g, ' ')
		.trim()
		.replace(/^\.+/, '');
	const stem = cleaned.replace(/\.[A-Za-z0-9]{1,5}$/, '').trim() || 'document';
	return `${stem.slice(0, 110)}.${UPLOAD_EXTENSIONS[type]}`;
}

export type UploadCheck =
	{ ok: true; type: UploadType; fileName: string; size: number } | { ok: false; message: string };

const MIB = 1024 * 1024;

/** Checks an upload's size and content; the message is written for the form's file field. */
export function checkUpload(name: string, bytes: Uint8Array): UploadCheck {
	if (bytes.length === 0) return { ok: false, message: 'The file is empty.' };
	if (bytes.length > MAX_UPLOAD_BYTES)
		return {
			ok: false,
			message: `The file is ${(bytes.length / MIB).toFixed(1)} MB; at most ${MAX_UPLOAD_BYTES / MIB} MB is accepted.`
		};
	const type = detectUploadType(bytes);
	if (!type)
		return {
			ok: false,
			message: 'Only PDF, PNG or JPEG files are accepted, and this file is none of them.'
		};
	return { ok: true, type, fileName: sanitizeFileName(name, type), size: bytes.length };
}
