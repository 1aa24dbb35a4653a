import { sequelize } from './db';

/** Removes the deposits a test file made, with their webhook events (these reference them). */
export async function deleteDeposits(ids: string[]): Promise<void> {
	if (ids.length === 0) return;
	await sequelize.transaction(async (transaction) => {
		const options = { replacements: { ids }, transaction };
		await sequelize.query('DELETE FROM stripe_events WHERE deposit_id IN (:ids)', options);
		await sequelize.query('DELETE FROM deposits WHERE id IN (:ids)', options);
	});
}
