import adapter from '@sveltejs/adapter-node';
import { vitePreprocess } from '@sveltejs/vite-plugin-svelte';

/** @type {import('@sveltejs/kit').Config} */
const config = {
	preprocess: vitePreprocess(),
	kit: {
		// SvelteKit's origin check stays on (the default): it is the CSRF protection of every form action.
		adapter: adapter({ out: 'build' }),
		typescript: {
			// Type-check (and lint) the scripts, migrations and seeders with the app.
			config: (tsconfig) => {
				tsconfig.include.push(
					'../migrations/**/*.ts',
					'../seeders/**/*.ts',
					'../scripts/**/*.ts',
					'../tailwind.config.ts',
					'../playwright.config.ts',
					'../eslint.config.js',
					'../svelte.config.js'
				);
			}
		}
	}
};

export default config;
