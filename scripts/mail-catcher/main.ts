// Runs the local SMTP catcher: `node --import tsx scripts/mail-catcher/main.ts`. Loopback only.
// Reads MAIL_CATCHER_SMTP_PORT (4325), MAIL_CATCHER_WEB_PORT (4326) and MAIL_CATCHER_FILE
// (a JSON file that keeps caught mail across restarts; in memory when unset).
import { startMailCatcher } from './app';

const env = process.env;
const catcher = await startMailCatcher({
	smtpPort: Number(env.MAIL_CATCHER_SMTP_PORT ?? 4325),
	webPort: Number(env.MAIL_CATCHER_WEB_PORT ?? 4326),
	file: env.MAIL_CATCHER_FILE || null,
	log: (line) => console.error(`[mail-catcher] ${line}`)
});
console.error(
	`[mail-catcher] SMTP on 127.0.0.1:${catcher.smtpPort}; caught mail at ${catcher.webUrl}`
);
const stop = () => void catcher.close().then(() => process.exit(0));
process.once('SIGINT', stop);
process.once('SIGTERM', stop);
