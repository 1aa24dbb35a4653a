/**
 * For the tests: a PDF read back as text per page (pdf-parse), and page 1 rendered to PNG with
 * poppler's pdftoppm when it is installed.
 */
import { execFileSync } from 'node:child_process';
import { existsSync, mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { PDFParse } from 'pdf-parse';

export async function pdfPages(
	pdf: Buffer
): Promise<{ total: number; pages: string[]; text: string }> {
	const parser = new PDFParse({ data: new Uint8Array(pdf) });
	try {
		const t = await parser.getText();
		return { total: t.total, pages: t.pages.map((p) => p.text), text: t.text };
	} finally {
		await parser.destroy();
	}
}

/** The Info dictionary as pdf.js reads it (dates as their PDF strings, 'D:YYYYMMDD…'). */
export async function pdfInfo(pdf: Buffer): Promise<Record<string, unknown>> {
	const parser = new PDFParse({ data: new Uint8Array(pdf) });
	try {
		return ((await parser.getInfo()).info ?? {}) as Record<string, unknown>;
	} finally {
		await parser.destroy();
	}
}

export function hasPdftoppm(): boolean {
	try {
		execFileSync('pdftoppm', ['-v'], { stdio: 'ignore' });
		return true;
	} catch {
		return false;
	}
}

/** Page 1 at `dpi` as a PNG file; returns its path. */
export function firstPagePng(pdf: Buffer, name: string, dpi = 60): string {
	const dir = mkdtempSync(join(tmpdir(), 'landfall-pdf-'));
	const file = join(dir, `${name}.pdf`);
	writeFileSync(file, pdf);
	const prefix = join(dir, name);
	execFileSync('pdftoppm', [
		'-png',
		'-r',
		String(dpi),
		'-f',
		'1',
		'-l',
		'1',
		'-singlefile',
		file,
		prefix
	]);
	const png = `${prefix}.png`;
	if (!existsSync(png)) throw new Error(`pdftoppm made no ${png}`);
	return png;
}

/** Width and height from a PNG's IHDR chunk. */
export function pngSize(path: string): { width: number; height: number; bytes: number } {
	const b = readFileSync(path);
	if (b.subarray(1, 4).toString('latin1') !== 'PNG') throw new Error(`${path} is not a PNG`);
	return { width: b.readUInt32BE(16), height: b.readUInt32BE(20), bytes: b.length };
}

/** '1,234.50' → '1234.50': a printed figure back to the plain decimal string. */
export function unprint(figure: string): string {
	return figure.replace(/,/g, '');
}
