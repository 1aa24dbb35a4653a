import { ConnectionRefusedError, DatabaseError, ValidationError } from 'sequelize';
import { describe, expect, it } from 'vitest';
import { isDatabaseOutage } from './outage';

// SQLSTATE codes: PostgreSQL 16 documentation, Appendix A "PostgreSQL Error Codes" (class 08
// connection exception, 57P01 admin_shutdown, 57P03 cannot_connect_now, 53300 too_many_connections).
const pgError = (code: string, message = 'x') => Object.assign(new Error(message), { code });

describe('isDatabaseOutage', () => {
	it('recognises a refused connection, as Sequelize wraps it', () => {
		const refused = Object.assign(new Error('connect ECONNREFUSED 127.0.0.1:5432'), {
			code: 'ECONNREFUSED'
		});
		expect(isDatabaseOutage(new ConnectionRefusedError(refused))).toBe(true);
	});

	it('recognises a server shutting down or starting up under a query', () => {
		for (const code of ['57P01', '57P03', '08006', '53300'])
			expect(isDatabaseOutage(new DatabaseError(pgError(code) as never)), code).toBe(true);
		expect(isDatabaseOutage(new Error('Connection terminated unexpectedly'))).toBe(true);
	});

	it('leaves real bugs and bad data alone', () => {
		expect(isDatabaseOutage(new DatabaseError(pgError('23505') as never))).toBe(false); // unique_violation
		expect(isDatabaseOutage(new DatabaseError(pgError('42P01') as never))).toBe(false); // undefined_table
		expect(isDatabaseOutage(new ValidationError('bad', []))).toBe(false);
		expect(isDatabaseOutage(new TypeError('x is undefined'))).toBe(false);
		expect(isDatabaseOutage(null)).toBe(false);
	});
});
