// The catcher's mailbox: parsed messages in memory, optionally kept in one JSON file (the demo
// keeps .data/mail-catcher.json so caught mail survives a restart; tests keep nothing).
import { randomUUID } from 'node:crypto';
import { existsSync, readFileSync, renameSync, writeFileSync } from 'node:fs';

export interface CaughtMessage {
	id: string;
	receivedAt: string;
	/** The SMTP envelope: who sent it and every RCPT TO. */
	envelope: { from: string | null; to: string[] };
	from: string;
	to: string;
	subject: string;
	text: string;
	html: string | null;
}

export type Summary = Omit<CaughtMessage, 'text' | 'html'>;

export class Mailbox {
	private messages: CaughtMessage[] = [];

	constructor(private readonly file: string | null) {
		if (file && existsSync(file)) this.messages = JSON.parse(readFileSync(file, 'utf8'));
	}

	add(message: Omit<CaughtMessage, 'id' | 'receivedAt'>): CaughtMessage {
		const caught = { id: randomUUID(), receivedAt: new Date().toISOString(), ...message };
		this.messages.push(caught);
		this.save();
		return caught;
	}

	/** Newest first. */
	list(): CaughtMessage[] {
		return [...this.messages].reverse();
	}

	get(id: string): CaughtMessage | undefined {
		return this.messages.find((m) => m.id === id);
	}

	clear(): void {
		this.messages = [];
		this.save();
	}

	private save() {
		if (!this.file) return;
		// Write then rename, so a crash never leaves half a file.
		writeFileSync(`${this.file}.tmp`, JSON.stringify(this.messages));
		renameSync(`${this.file}.tmp`, this.file);
	}
}

export const summary = ({ text: _t, html: _h, ...rest }: CaughtMessage): Summary => rest;
