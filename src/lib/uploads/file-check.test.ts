import { describe, expect, it } from 'vitest';
import { checkUpload, detectUploadType, MAX_UPLOAD_BYTES, sanitizeFileName } from './file-check';

const bytes = (...b: number[]) => new Uint8Array(b);
const text = (s: string) => new TextEncoder().encode(s);

describe('detectUploadType', () => {
	// Signatures: ISO 32000-2:2020 7.5.2 (PDF), W3C PNG 2nd ed. (ISO/IEC 15948) 5.2, ITU-T T.81 B.1.1.3.
	it('knows PDF, PNG and JPEG by their first bytes', () => {
		expect(detectUploadType(text('%PDF-1.7\n%âãÏÓ\n'))).toBe('application/pdf');
		expect(detectUploadType(bytes(0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a, 0))).toBe(
			'image/png'
		);
		expect(detectUploadType(bytes(0xff, 0xd8, 0xff, 0xe0, 0, 0x10))).toBe('image/jpeg');
	});

	it('refuses executables, archives and text, whatever they contain later', () => {
		expect(detectUploadType(text('MZ\x90\x00 ... %PDF-1.4'))).toBeNull(); // Windows PE
		expect(detectUploadType(bytes(0x7f, 0x45, 0x4c, 0x46, 2, 1, 1))).toBeNull(); // ELF
		expect(detectUploadType(bytes(0x50, 0x4b, 0x03, 0x04, 0x14))).toBeNull(); // ZIP
		expect(detectUploadType(text('<html><script>alert(1)</script>'))).toBeNull();
		expect(detectUploadType(bytes(0x89, 0x50, 0x4e))).toBeNull(); // truncated signature
	});

	it('accepts a PDF header within the first KiB, as readers do', () => {
		expect(detectUploadType(text('junk\r\n%PDF-1.4\n'))).toBe('application/pdf');
	});
});

describe('sanitizeFileName', () => {
	it('strips any path, Unix or Windows', () => {
		expect(sanitizeFileName('../../etc/passwd.pdf', 'application/pdf')).toBe('passwd.pdf');
		expect(sanitizeFileName('C:\\Users\\x\\UN38.3 summary.pdf', 'application/pdf')).toBe(
			'UN38.3 summary.pdf'
		);
	});

	it('drops control and reserved characters and leading dots, and names the real type', () => {
		expect(sanitizeFileName('.hidden"<x>\u0000.pdf', 'application/pdf')).toBe('hiddenx.pdf');
		expect(sanitizeFileName('photo.pdf', 'image/jpeg')).toBe('photo.jpg');
		expect(sanitizeFileName('', 'image/png')).toBe('document.png');
		expect(sanitizeFileName('a'.repeat(300) + '.pdf', 'application/pdf')).toHaveLength(114);
	});
});

describe('checkUpload', () => {
	it('refuses an executable renamed .pdf', () => {
		expect(checkUpload('summary.pdf', text('MZ\x90\x00\x03'))).toMatchObject({ ok: false });
	});

	it('refuses an empty file and one over 10 MB', () => {
		expect(checkUpload('a.pdf', new Uint8Array(0))).toEqual({
			ok: false,
			message: 'The file is empty.'
		});
		const big = new Uint8Array(11 * 1024 * 1024);
		big.set(text('%PDF-1.7'));
		const r = checkUpload('big.pdf', big);
		expect(r).toMatchObject({ ok: false });
		expect(!r.ok && r.message).toMatch(/11\.0 MB; at most 10 MB/);
	});

	it('accepts exactly 10 MiB', () => {
		const max = new Uint8Array(MAX_UPLOAD_BYTES);
		max.set(text('%PDF-1.7'));
		expect(checkUpload('max.pdf', max)).toMatchObject({ ok: true, size: MAX_UPLOAD_BYTES });
	});
});
