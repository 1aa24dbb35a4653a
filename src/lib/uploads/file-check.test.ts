import { describe, expect, it } from 'vitest';
import {
	checkUpload,
	detectUploadType,
	MAX_FILE_NAME_LENGTH,
	MAX_UPLOAD_BYTES,
	sanitizeFileName
} from './file-check';

const bytes = (...b: number[]) => new Uint8Array(b);
const text = (s: string) => new TextEncoder().encode(s);

describe('detectUploadType', () => {
	// Signatures: ISO 32000-2:2020 7.5.2 "%PDF-" (PDF); ISO/IEC 15948:2004 (W3C PNG 2nd ed.) 5.2
	// 89 50 4E 47 0D 0A 1A 0A (PNG); ITU-T T.81 (1992) B.1.1.3, SOI FF D8 then a marker FF xx (JPEG).
	// Section numbers from memory.
	it('knows PDF, PNG and JPEG by their first bytes', () => {
		expect(detectUploadType(text('%PDF-1.7\n%âãÏÓ\n'))).toBe('application/pdf');
		expect(detectUploadType(bytes(0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a, 0))).toBe(
			'image/png'
		);
		expect(detectUploadType(bytes(0xff, 0xd8, 0xff, 0xe0, 0, 0x10))).toBe('image/jpeg');
		expect(detectUploadType(bytes(0xff, 0xd8, 0xff, 0xe1, 0, 0x10))).toBe('image/jpeg'); // Exif
	});

	// Executable headers: "MZ" (Microsoft PE/COFF specification, MS-DOS stub) and 7F "ELF"
	// (System V ABI, ELF identification); ZIP local file header 50 4B 03 04 (PKWARE APPNOTE
	// 4.3.7). From memory.
	it('refuses executables, archives and text, whatever they contain later', () => {
		expect(detectUploadType(text('MZ\x90\x00 ... %PDF-1.4'))).toBeNull();
		expect(detectUploadType(bytes(0x7f, 0x45, 0x4c, 0x46, 2, 1, 1))).toBeNull();
		expect(detectUploadType(bytes(0x50, 0x4b, 0x03, 0x04, 0x14))).toBeNull();
		expect(detectUploadType(text('<html><script>alert(1)</script>'))).toBeNull();
		expect(detectUploadType(text('<svg xmlns="http://www.w3.org/2000/svg"/>'))).toBeNull();
		expect(detectUploadType(bytes(0x89, 0x50, 0x4e))).toBeNull(); // truncated signature
		expect(detectUploadType(bytes(0xff, 0xd8))).toBeNull();
		expect(detectUploadType(new Uint8Array(0))).toBeNull();
	});

	it('wants the PDF header at byte 0, so a page with one a line in is refused', () => {
		expect(detectUploadType(text('<html>\n%PDF-1.4\n'))).toBeNull();
		expect(detectUploadType(text(' %PDF-1.4\n'))).toBeNull();
		expect(detectUploadType(text('%PDF1.4'))).toBeNull(); // no hyphen
	});
});

describe('sanitizeFileName', () => {
	it('strips any path, Unix or Windows', () => {
		expect(sanitizeFileName('../../etc/passwd.pdf', 'application/pdf')).toBe('passwd.pdf');
		expect(sanitizeFileName('C:\\x\\y.pdf', 'application/pdf')).toBe('y.pdf');
		expect(sanitizeFileName('C:\\Users\\x\\UN38.3 summary.pdf', 'application/pdf')).toBe(
			'UN38.3 summary.pdf'
		);
		expect(sanitizeFileName('dir/', 'application/pdf')).toBe('document.pdf');
	});

	it('drops control, reserved and invisible characters and leading dots', () => {
		expect(sanitizeFileName('.hidden"<x>\u0000.pdf', 'application/pdf')).toBe('hiddenx.pdf');
		expect(sanitizeFileName('...', 'application/pdf')).toBe('document.pdf');
		expect(sanitizeFileName('a\tb\r\nc.pdf', 'application/pdf')).toBe('abc.pdf');
		// U+202E (right-to-left override) would show "summary\u202Efdp.exe" as "summaryexe.pdf".
		expect(sanitizeFileName('summary\u202Efdp.exe', 'application/pdf')).toBe('summaryfdp.pdf');
		expect(sanitizeFileName('CON.pdf', 'application/pdf')).toBe('CON-file.pdf');
	});

	it('names the type the content is, whatever the name said', () => {
		expect(sanitizeFileName('photo.pdf', 'image/jpeg')).toBe('photo.jpg');
		expect(sanitizeFileName('report.exe', 'application/pdf')).toBe('report.pdf');
		expect(sanitizeFileName('scan', 'image/png')).toBe('scan.png');
		expect(sanitizeFileName('', 'image/png')).toBe('document.png');
	});

	it('caps the length at 120 characters, extension included', () => {
		const long = sanitizeFileName('a'.repeat(300) + '.pdf', 'application/pdf');
		expect(long).toHaveLength(MAX_FILE_NAME_LENGTH);
		expect(long.endsWith('a.pdf')).toBe(true);
		// Counted in characters, so a name is never cut inside a surrogate pair.
		const emoji = sanitizeFileName('📦'.repeat(200) + '.pdf', 'application/pdf');
		expect([...emoji]).toHaveLength(MAX_FILE_NAME_LENGTH);
		expect(emoji.isWellFormed()).toBe(true);
	});
});

describe('checkUpload', () => {
	it('refuses an executable renamed .pdf, whatever type the browser declared', () => {
		const r = checkUpload({
			name: 'summary.pdf',
			bytes: text('MZ\x90\x00\x03'),
			declaredType: 'application/pdf'
		});
		expect(r).toMatchObject({ ok: false });
		expect(!r.ok && r.message).toMatch(/Only PDF, PNG or JPEG/);
	});

	it('accepts a real PDF declared as something else, and names it by content', () => {
		expect(
			checkUpload({ name: 'x.bin', bytes: text('%PDF-1.4\n'), declaredType: 'text/html' })
		).toEqual({ ok: true, type: 'application/pdf', fileName: 'x.pdf', size: 9 });
	});

	it('refuses an empty file and one over 10 MB (10 × 1024 × 1024 bytes)', () => {
		expect(checkUpload({ name: 'a.pdf', bytes: new Uint8Array(0) })).toEqual({
			ok: false,
			message: 'The file is empty.'
		});
		const big = new Uint8Array(11 * 1024 * 1024);
		big.set(text('%PDF-1.7'));
		const r = checkUpload({ name: 'big.pdf', bytes: big });
		expect(r).toMatchObject({ ok: false });
		expect(!r.ok && r.message).toBe('The file is 11.0 MB; at most 10 MB is accepted.');
		const justOver = new Uint8Array(MAX_UPLOAD_BYTES + 1);
		justOver.set(text('%PDF-1.7'));
		expect(checkUpload({ name: 'b.pdf', bytes: justOver })).toEqual({
			ok: false,
			message: 'The file is over 10 MB; at most 10 MB is accepted.'
		});
	});

	it('accepts exactly 10 MiB', () => {
		expect(MAX_UPLOAD_BYTES).toBe(10_485_760);
		const max = new Uint8Array(MAX_UPLOAD_BYTES);
		max.set(text('%PDF-1.7'));
		expect(checkUpload({ name: 'max.pdf', bytes: max })).toMatchObject({
			ok: true,
			size: MAX_UPLOAD_BYTES
		});
	});
});
