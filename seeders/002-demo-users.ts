import { col, fn, where, type Sequelize } from 'sequelize';
import { hashPassword } from '../src/lib/server/auth/password';
import { Organization, User } from '../src/lib/server/db/models';
import { DEMO_ORGANIZATIONS, DEMO_PASSWORD, DEMO_USERS } from './demo-scenario';

// Idempotent: a demo user is created once; later runs leave changed roles or passwords alone.
export async function seed(sequelize: Sequelize): Promise<void> {
	const passwordHash = await hashPassword(DEMO_PASSWORD);
	await sequelize.transaction(async (transaction) => {
		for (const demo of DEMO_USERS) {
			const orgName = DEMO_ORGANIZATIONS.find((o) => o.key === demo.organization)!.name;
			const organization = await Organization.findOne({
				where: where(fn('lower', col('name')), orgName.toLowerCase()),
				transaction,
				rejectOnEmpty: true
			});
			const existing = await User.findOne({
				where: where(fn('lower', col('email')), demo.email.toLowerCase()),
				transaction
			});
			if (existing) continue;
			await User.create(
				{
					email: demo.email,
					name: demo.name,
					role: demo.role,
					organizationId: organization.id,
					passwordHash,
					disabled: demo.disabled ?? false
				},
				{ transaction }
			);
		}
	});
}
