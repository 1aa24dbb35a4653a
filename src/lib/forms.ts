/** The message a form action attaches to a superform: a success note or an error summary. */
export interface FormNote {
	tone: 'ok' | 'error';
	text: string;
}

/** Countries as select choices: "Germany (DE)". */
export function countryChoices(countries: readonly { code: string; name: string }[]) {
	return countries.map((c) => ({ value: c.code, label: `${c.name} (${c.code})` }));
}
