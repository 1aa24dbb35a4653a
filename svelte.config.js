import adapter from '@sveltejs/adapter-node';
import { vitePreprocess } from '@sveltejs/vite-plugin-svelte';

/** @type {import('@sveltejs/kit').Config} */
const config = {
	preprocess: vitePreprocess(),
	kit: {
		// SvelteKit's origin check stays on (the default): it is the CSRF protection of every form action.
		adapter: adapter({ out: 'build' }),
		// Scripts only from the app itself (SvelteKit hashes its own inline start-up script).
		// The rest of the policy is a second header from hooks.server.ts (content-security.ts).
		csp: {
			mode: 'hash',
			directives: {
				'default-src': ['self'],
				'script-src': ['self'],
				// Style attributes (chart bar sizes, 3D view) need inline styles; no inline scripts.
				'style-src': ['self', 'unsafe-inline'],
				'img-src': ['self', 'data:', 'blob:'],
				'font-src': ['self'],
				'connect-src': ['self'],
				'object-src': ['none'],
				'base-uri': ['self'],
				'frame-ancestors': ['none']
			}
		},
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
