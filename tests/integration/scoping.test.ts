// Organization scoping: customers and brokers see only their own organization, staff see all.
// Read-only: these tests change nothing in the database.
import { beforeAll, describe, expect, it } from 'vitest';
import type { Role } from '$lib/roles';
import type { SessionUser } from '$lib/server/auth/session-user';
import { organizationHeadcounts } from '$lib/server/services/dashboard';
import { recentPapers } from '$lib/server/services/recent-papers';
import { getOrganization, listOrganizations } from '$lib/server/services/organizations';
import { DEMO_ORGANIZATIONS } from '../../seeders/demo-scenario';
import { demoOrganization, sessionUserFor } from './db';

const MISSING_ID = '00000000-0000-4000-8000-000000000000';
const DEMO_NAMES = DEMO_ORGANIZATIONS.map((o) => o.name);
const ids: Record<string, string> = {};

beforeAll(async () => {
	for (const demo of DEMO_ORGANIZATIONS) ids[demo.key] = (await demoOrganization(demo.key)).id;
});

function idOf(key: string): string {
	const id = ids[key];
	if (!id) throw new Error(`no id for ${key}`);
	return id;
}

describe.each([
	{ email: 'buyer@hallvik.example', own: 'hallvik', role: 'customer' },
	{ email: 'buyer@wattlebird.example', own: 'wattlebird', role: 'customer' },
	{ email: 'broker@kaaiman.example', own: 'broker', role: 'broker' }
] as const satisfies readonly { email: string; own: string; role: Role }[])(
	'$email ($role) sees only their own organization',
	({ email, own, role }) => {
		let user: SessionUser;
		beforeAll(async () => {
			user = await sessionUserFor(email);
		});

		it('has the expected session', () => {
			expect(user).toMatchObject({ role, organizationId: idOf(own) });
		});

		it('listOrganizations returns only their organization', async () => {
			const list = await listOrganizations(user);
			expect(list.map((o) => o.id)).toEqual([idOf(own)]);
			expect(list[0]?.name).toBe(DEMO_ORGANIZATIONS.find((o) => o.key === own)?.name);
		});

		it('getOrganization returns their organization with addresses and tax ids', async () => {
			const organization = await getOrganization(user, idOf(own));
			const demo = DEMO_ORGANIZATIONS.find((o) => o.key === own)!;
			expect(organization).toMatchObject({ id: idOf(own), name: demo.name, kind: demo.kind });
			expect(organization!.addresses).toHaveLength(demo.addresses.length);
			expect(organization!.taxIds.map((t) => t.value).sort()).toEqual(
				demo.taxIds.map((t) => t.value).sort()
			);
		});

		it('getOrganization answers null for every other organization, as for one that does not exist', async () => {
			for (const demo of DEMO_ORGANIZATIONS.filter((o) => o.key !== own)) {
				expect(await getOrganization(user, idOf(demo.key)), demo.name).toBeNull();
			}
			expect(await getOrganization(user, MISSING_ID)).toBeNull();
		});

		it('organizationHeadcounts covers only their organization', async () => {
			const counts = await organizationHeadcounts(user);
			expect(counts.map((c) => c.id)).toEqual([idOf(own)]);
			expect(counts[0]!.byRole[role]).toBeGreaterThanOrEqual(1);
		});
	}
);

describe('Hallvik’s buyer in particular', () => {
	it('cannot open Wattlebird, the other customer', async () => {
		const buyer = await sessionUserFor('buyer@hallvik.example');
		expect(await getOrganization(buyer, idOf('wattlebird'))).toBeNull();
		expect((await listOrganizations(buyer)).map((o) => o.name)).toEqual([
			'Hallvik Heimtechnik GmbH'
		]);
	});
});

describe.each(['coordinator@solvrae.example', 'finance@solvrae.example', 'admin@solvrae.example'])(
	'staff member %s sees every organization',
	(email) => {
		let staff: SessionUser;
		beforeAll(async () => {
			staff = await sessionUserFor(email);
		});

		it('listOrganizations includes all 6 demo organizations, sorted by name', async () => {
			const list = await listOrganizations(staff);
			// Other test files may add organizations of their own; the demo ones must all be there.
			const names = list.map((o) => o.name);
			expect(DEMO_NAMES).toHaveLength(6);
			expect(names).toEqual(expect.arrayContaining(DEMO_NAMES));
			// The demo names start with different capitals, so every collation orders them alike.
			expect(names.filter((n) => DEMO_NAMES.includes(n))).toEqual([...DEMO_NAMES].sort());
			expect(new Set(list.map((o) => o.kind))).toEqual(
				new Set(['exporter', 'customer', 'broker', 'forwarder'])
			);
		});

		it('getOrganization opens each of them', async () => {
			for (const demo of DEMO_ORGANIZATIONS) {
				expect(await getOrganization(staff, idOf(demo.key)), demo.name).toMatchObject({
					name: demo.name
				});
			}
			expect(await getOrganization(staff, MISSING_ID)).toBeNull();
		});

		it('organizationHeadcounts covers all of them, counting the disabled demo user apart', async () => {
			const counts = await organizationHeadcounts(staff);
			expect(counts.map((c) => c.id)).toEqual(expect.arrayContaining(Object.values(ids)));
			const exporter = counts.find((c) => c.id === idOf('exporter'))!;
			expect(exporter.byRole.admin).toBeGreaterThanOrEqual(1);
			expect(exporter.byRole.coordinator).toBeGreaterThanOrEqual(1);
			expect(exporter.disabled).toBeGreaterThanOrEqual(1); // former.planner@solvrae.example
			const forwarder = counts.find((c) => c.id === idOf('forwarder'))!;
			expect(forwarder.byRole).toMatchObject({ customer: 0, broker: 0 });
		});
	}
);

describe('latest papers on the overview', () => {
	it('give a customer only the papers of its own shipments', async () => {
		const cedarpoint = await sessionUserFor('buyer@cedarpoint.example');
		const own = await recentPapers(cedarpoint);
		// Seeder 005 issues Cedarpoint's invoice and packing list.
		expect(own.map((p) => p.kind).sort()).toEqual(['commercial_invoice', 'packing_list']);
		const wattlebird = await recentPapers(await sessionUserFor('buyer@wattlebird.example'));
		expect(wattlebird.filter((p) => own.some((o) => o.id === p.id))).toEqual([]);
	});
});
