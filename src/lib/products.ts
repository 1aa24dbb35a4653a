// Product vocabulary shared by forms, pages and server (framework-free).

export const BATTERY_CONFIG_VALUES = ['none', 'contained', 'packed_with', 'standalone'] as const;
export const BATTERY_CHEMISTRY_VALUES = ['lithium_ion', 'lithium_metal'] as const;

export const BATTERY_CONFIG_LABELS: Record<(typeof BATTERY_CONFIG_VALUES)[number], string> = {
	none: 'No battery',
	contained: 'Battery contained in the equipment',
	packed_with: 'Battery packed with the equipment',
	standalone: 'Battery on its own'
};

export const BATTERY_CHEMISTRY_LABELS: Record<(typeof BATTERY_CHEMISTRY_VALUES)[number], string> = {
	lithium_ion: 'Lithium-ion',
	lithium_metal: 'Lithium metal'
};

export const ORIENTATION_LABELS = { any: 'Any way up', this_way_up: 'This way up only' } as const;
