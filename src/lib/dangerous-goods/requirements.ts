/** One thing a rule asks for, with where the rule comes from. Pure module. */
import type { RuleSource } from './sources';

export interface LithiumRequirement {
	/** Stable identifier, e.g. 'air_soc_required'. */
	id: string;
	text: string;
	source: RuleSource;
	/** True when someone must do something (false: information). */
	action: boolean;
}
