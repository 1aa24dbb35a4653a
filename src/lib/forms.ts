/** The message a form action attaches to a superform: a success note or an error summary. */
export interface FormNote {
	tone: 'ok' | 'error';
	text: string;
}
