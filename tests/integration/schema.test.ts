// The schema that migrations/ built, read back from information_schema (SQL standard views, as
// PostgreSQL implements them: PostgreSQL 17 documentation, chapter 35 "The Information Schema").
import { readdir } from 'node:fs/promises';
import { fileURLToPath } from 'node:url';
import { QueryTypes, UniqueConstraintError } from 'sequelize';
import { describe, expect, it } from 'vitest';
import { User } from '$lib/server/db/models';
import { demoOrganization, sequelize } from './db';

interface ColumnRow {
	table_name: string;
	column_name: string;
	data_type: string;
	udt_name: string;
}

async function publicColumns(): Promise<ColumnRow[]> {
	return sequelize.query<ColumnRow>(
		`SELECT c.table_name, c.column_name, c.data_type, c.udt_name
		   FROM information_schema.columns c
		   JOIN information_schema.tables t
		     ON t.table_schema = c.table_schema AND t.table_name = c.table_name
		  WHERE c.table_schema = 'public' AND t.table_type = 'BASE TABLE'
		  ORDER BY c.table_name, c.ordinal_position`,
		{ type: QueryTypes.SELECT }
	);
}

const label = (c: ColumnRow) => `${c.table_name}.${c.column_name} (${c.data_type})`;

describe('column types', () => {
	it('finds the tables the migrations create', async () => {
		const tables = new Set((await publicColumns()).map((c) => c.table_name));
		for (const table of [
			'organizations',
			'organization_addresses',
			'organization_tax_ids',
			'users',
			'audit_events',
			'sign_in_attempts',
			'schema_migrations'
		]) {
			expect(tables, table).toContain(table);
		}
	});

	// Money and quantities are NUMERIC. PostgreSQL 17 documentation, section 8.1.3 "Floating-Point
	// Types": real and double precision are "inexact, variable-precision"; "If you require exact
	// storage and calculations (such as for monetary amounts), use the numeric type instead."
	it('has no floating-point column (real, double precision, float) anywhere', async () => {
		const floats = (await publicColumns()).filter(
			(c) =>
				['real', 'double precision'].includes(c.data_type) ||
				['float4', 'float8', '_float4', '_float8'].includes(c.udt_name)
		);
		expect(floats.map(label)).toEqual([]);
	});

	// PostgreSQL wiki, "Don't Do This", section "Don't use timestamp (without time zone)": a
	// timestamptz is one moment in time; a plain timestamp is a wall-clock reading without a zone.
	it('stores every timestamp as timestamp with time zone', async () => {
		const columns = await publicColumns();
		const timestamps = columns.filter((c) => c.data_type.startsWith('timestamp'));
		expect(timestamps.length).toBeGreaterThanOrEqual(10); // the check is not vacuous
		expect(timestamps.filter((c) => c.data_type !== 'timestamp with time zone').map(label)).toEqual(
			[]
		);
		// Array columns of timestamps report data_type ARRAY; they must be timestamptz[] too.
		expect(columns.filter((c) => c.udt_name === '_timestamp').map(label)).toEqual([]);
	});
});

describe('foreign keys', () => {
	interface ForeignKeyRow {
		table_name: string;
		column_name: string;
		foreign_table: string;
		foreign_column: string;
		delete_rule: string;
	}

	async function foreignKeys(): Promise<ForeignKeyRow[]> {
		return sequelize.query<ForeignKeyRow>(
			`SELECT kcu.table_name, kcu.column_name,
			        ccu.table_name AS foreign_table, ccu.column_name AS foreign_column, rc.delete_rule
			   FROM information_schema.referential_constraints rc
			   JOIN information_schema.key_column_usage kcu
			     ON kcu.constraint_schema = rc.constraint_schema AND kcu.constraint_name = rc.constraint_name
			   JOIN information_schema.constraint_column_usage ccu
			     ON ccu.constraint_schema = rc.unique_constraint_schema
			    AND ccu.constraint_name = rc.unique_constraint_name
			  WHERE rc.constraint_schema = 'public'`,
			{ type: QueryTypes.SELECT }
		);
	}

	it.each([
		['users', 'organization_id', 'organizations', 'RESTRICT'],
		['audit_events', 'actor_user_id', 'users', 'SET NULL'],
		['organization_addresses', 'organization_id', 'organizations', 'CASCADE'],
		['organization_tax_ids', 'organization_id', 'organizations', 'CASCADE']
	])('%s.%s references %s(id) ON DELETE %s', async (table, column, foreignTable, deleteRule) => {
		const keys = (await foreignKeys()).filter(
			(k) => k.table_name === table && k.column_name === column
		);
		expect(keys).toEqual([
			{
				table_name: table,
				column_name: column,
				foreign_table: foreignTable,
				foreign_column: 'id',
				delete_rule: deleteRule
			}
		]);
	});
});

describe('users e-mail uniqueness', () => {
	it('refuses a second user whose e-mail differs from a demo user only in letter case', async () => {
		const exporter = await demoOrganization('exporter');
		// Inside a transaction that is always rolled back, so nothing stays even if the index were missing.
		const transaction = await sequelize.transaction();
		try {
			await expect(
				User.create(
					{
						email: 'Admin@Solvrae.example',
						name: 'Case twin',
						role: 'admin',
						organizationId: exporter.id,
						passwordHash: 'not-a-real-hash'
					},
					{ transaction }
				)
			).rejects.toBeInstanceOf(UniqueConstraintError);
		} finally {
			await transaction.rollback();
		}
		expect(await User.count({ where: { email: 'Admin@Solvrae.example' } })).toBe(0);
	});

	it('keeps that rule in a unique index on lower(email)', async () => {
		const [index] = await sequelize.query<{ indexdef: string }>(
			`SELECT indexdef FROM pg_indexes
			  WHERE schemaname = 'public' AND tablename = 'users' AND indexname = 'users_email_key'`,
			{ type: QueryTypes.SELECT }
		);
		expect(index?.indexdef).toMatch(/^CREATE UNIQUE INDEX .* \(lower\(email\)\)$/);
	});
});

describe('schema_migrations', () => {
	it('lists every file in migrations/, and nothing else', async () => {
		const files = (await readdir(fileURLToPath(new URL('../../migrations', import.meta.url))))
			.filter((f) => f.endsWith('.ts'))
			.sort();
		expect(files.length).toBeGreaterThan(0);
		const rows = await sequelize.query<{ name: string }>(
			'SELECT name FROM schema_migrations ORDER BY name',
			{ type: QueryTypes.SELECT }
		);
		expect(rows.map((r) => r.name)).toEqual(files);
	});
});
