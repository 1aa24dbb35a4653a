// Memory of another process (the app under load) from /proc/PID/status: VmHWM is the kernel's
// own peak resident set, so it misses nothing between samples; VmRSS sampled during a run gives
// that run's peak for the table.
import { readFileSync } from 'node:fs';

export interface Memory {
	rssMiB: number;
	hwmMiB: number;
}

/** VmRSS and VmHWM of `pid` in MiB; null when it cannot be read (gone, or not Linux). */
export function readMemory(pid: number): Memory | null {
	try {
		const status = readFileSync(`/proc/${pid}/status`, 'utf8');
		const kib = (field: string) =>
			Number(new RegExp(`^${field}:\\s+(\\d+) kB`, 'm').exec(status)?.[1]);
		const rss = kib('VmRSS');
		const hwm = kib('VmHWM');
		return Number.isFinite(rss) && Number.isFinite(hwm)
			? { rssMiB: rss / 1024, hwmMiB: hwm / 1024 }
			: null;
	} catch {
		return null;
	}
}

/** Samples VmRSS every `everyMs` until stopped; returns the highest seen (MiB), NaN if none. */
export function sampleRss(pid: number, everyMs = 200): () => number {
	let peak = Number.NaN;
	const take = () => {
		const m = readMemory(pid);
		if (m && !(m.rssMiB <= peak)) peak = m.rssMiB;
	};
	take();
	const timer = setInterval(take, everyMs);
	return () => {
		clearInterval(timer);
		take();
		return peak;
	};
}
