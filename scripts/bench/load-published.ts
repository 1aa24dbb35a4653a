// Published full-support results (mean volume utilisation %, per set), as transcribed in the data
// folder's README (../shared/benchmarks/container-loading/README.md, "Published results"); the
// README marks each figure [V] read in a public repository, [C] computed, or [M] from memory,
// unverified against the papers. Full support only: the no-support figures are not comparable.

export interface Published {
	/** Best full-support figure in the README for the set. */
	best: number;
	/** Who reported it, and the README's status mark. */
	by: string;
	/** Fanslau & Bortfeldt 2010 CLTRS, packing variant (the only full-support row for all sets). */
	cltrs: number;
}

const CLTRS = 'Fanslau & Bortfeldt 2010 CLTRS packing [M]';
const BRKGA = 'Gonçalves & Resende 2012 BRKGA [V; support not verified]';
const VCS = 'Araya, Guerrero & Nuñez 2017 BSG-VCS [V]';

export const PUBLISHED: Record<number, Published> = {
	1: { best: 94.74, by: VCS, cltrs: 94.51 },
	2: { best: 95.38, by: VCS, cltrs: 94.73 },
	3: { best: 95.05, by: BRKGA, cltrs: 94.74 },
	4: { best: 94.75, by: BRKGA, cltrs: 94.41 },
	5: { best: 94.58, by: BRKGA, cltrs: 94.13 },
	6: { best: 94.38, by: BRKGA, cltrs: 93.85 },
	7: { best: 93.74, by: BRKGA, cltrs: 93.2 },
	8: { best: 92.26, by: CLTRS, cltrs: 92.26 },
	9: { best: 91.48, by: CLTRS, cltrs: 91.48 },
	10: { best: 90.86, by: CLTRS, cltrs: 90.86 },
	11: { best: 90.11, by: CLTRS, cltrs: 90.11 },
	12: { best: 89.51, by: CLTRS, cltrs: 89.51 },
	13: { best: 88.98, by: CLTRS, cltrs: 88.98 },
	14: { best: 88.26, by: CLTRS, cltrs: 88.26 },
	15: { best: 87.57, by: CLTRS, cltrs: 87.57 }
};
