/**
 * A shipment's current papers as one ZIP (archiver), with a SHA256SUMS file so the recipient can
 * check each PDF against the register (`sha256sum -c SHA256SUMS`).
 */
import { ZipArchive } from 'archiver';
import type { PaperFile } from './register';

export async function papersZip(files: readonly PaperFile[], issuedOn: Date): Promise<Buffer> {
	const zip = new ZipArchive({ zlib: { level: 6 } });
	const chunks: Buffer[] = [];
	zip.on('data', (chunk: Buffer) => chunks.push(chunk));
	const done = new Promise<void>((resolve, reject) => {
		zip.on('end', () => resolve());
		zip.on('error', reject);
	});
	for (const f of files) zip.append(f.pdf, { name: f.fileName, date: issuedOn });
	const sums = files.map((f) => `${f.sha256}  ${f.fileName}\n`).join('');
	zip.append(sums, { name: 'SHA256SUMS', date: issuedOn });
	await zip.finalize();
	await done;
	return Buffer.concat(chunks);
}
