import adapter from '@sveltejs/adapter-node';
import { vitePreprocess } from '@sveltejs/vite-plugin-svelte';

/** @type {import('@sveltejs/kit').Config} */
const config = {
	preprocess: vitePreprocess(),
	kit: {
		// SvelteKit's origin check stays on (the default): it is the CSRF protection of every form action.
		adapter: adapter({ out: 'build' })
	}
};

export default config;
