// The fuzz specs' common settings (DEVELOPERS.md, "Fuzzing"): FUZZ_SEED reproduces a run,
// FUZZ_RUNS scales the cases, FUZZ_ONLY (a substring of a test title) runs only that target.
export const SEED = Number(process.env.FUZZ_SEED ?? 20261204);
export const RUNS = Number(process.env.FUZZ_RUNS ?? 20);
export const ONLY = process.env.FUZZ_ONLY ?? '';
