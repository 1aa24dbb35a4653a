import { fail, redirect, type RequestEvent } from '@sveltejs/kit';
import { requireRole } from './auth/guard';
import { readForm } from './forms';
import { removeRecord, setActive } from './services/master-data';

// The retire, reinstate and remove actions of the place and party pages (same rules for both).

type Kind = 'place' | 'party';
const LIST = { place: '/places', party: '/parties' } as const;
const PARAM = { place: 'placeId', party: 'partyId' } as const;

function action(kind: Kind, op: 'retire' | 'reinstate' | 'remove') {
	return async (event: RequestEvent) => {
		const user = requireRole(event, 'admin', 'coordinator');
		const version = Number((await readForm(event.request)).get('version'));
		if (!Number.isInteger(version) || version < 0)
			return fail(400, { stateError: 'The form was incomplete. Reload the page and try again.' });
		const id = (event.params as Record<string, string>)[PARAM[kind]]!;
		const ip = event.getClientAddress();
		if (op === 'remove') {
			const result = await removeRecord(user, kind, id, version, ip);
			if (!result.ok) return fail(result.status, { stateError: result.message });
			redirect(303, `${LIST[kind]}?removed=${encodeURIComponent(result.value.name)}`);
		}
		const result = await setActive(user, kind, id, version, op === 'reinstate', ip);
		if (!result.ok) return fail(result.status, { stateError: result.message });
		return {
			stateNote:
				op === 'retire'
					? 'Retired: no longer offered for new shipments; kept on those that name it.'
					: 'Reinstated: offered for new shipments again.'
		};
	};
}

export function lifecycleActions(kind: Kind) {
	return {
		retire: action(kind, 'retire'),
		reinstate: action(kind, 'reinstate'),
		remove: action(kind, 'remove')
	};
}
