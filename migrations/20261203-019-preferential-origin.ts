import type { Migration } from '../src/lib/server/db/migrator';

// A claim of preferential origin under a trade agreement, and the origin statement the invoice
// then carries. The wording is the user's: each agreement prescribes its own text, so Landfall
// stores what is written and never supplies legal wording.
export const up: Migration = async ({ context: qi }) => {
	await qi.sequelize.query(`
		ALTER TABLE shipments
			ADD COLUMN preferential_origin_claimed boolean NOT NULL DEFAULT false,
			ADD COLUMN preferential_agreement text CHECK (char_length(preferential_agreement) <= 200),
			ADD COLUMN origin_statement text CHECK (char_length(origin_statement) <= 2000);
	`);
};

export const down: Migration = async ({ context: qi }) => {
	await qi.sequelize.query(`
		ALTER TABLE shipments
			DROP COLUMN origin_statement,
			DROP COLUMN preferential_agreement,
			DROP COLUMN preferential_origin_claimed;
	`);
};
