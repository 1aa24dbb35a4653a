import js from '@eslint/js';
import svelte from 'eslint-plugin-svelte';
import globals from 'globals';
import ts from 'typescript-eslint';
import svelteConfig from './svelte.config.js';

export default ts.config(
	{
		ignores: [
			'build/',
			'.svelte-kit/',
			'.data/',
			'node_modules/',
			'test-results/',
			'playwright-report/'
		]
	},
	js.configs.recommended,
	...ts.configs.recommended,
	...svelte.configs.recommended,
	{
		languageOptions: {
			globals: { ...globals.browser, ...globals.node },
			parserOptions: { projectService: true, tsconfigRootDir: import.meta.dirname }
		},
		rules: {
			// An unawaited promise loses its error: always await, return or void it.
			'@typescript-eslint/no-floating-promises': 'error',
			'@typescript-eslint/no-unused-vars': ['error', { argsIgnorePattern: '^_' }],
			'no-undef': 'off'
		}
	},
	{
		// Posted forms go through validateForm / readForm ($lib/server/forms), which turn bodies no
		// page sends (wrong type, broken multipart, nested data as plain fields, NUL) into field
		// errors; read directly, they were 500s (tests/e2e/fuzz.spec.ts).
		files: ['src/routes/**/*.ts', 'src/lib/server/**/*.ts'],
		ignores: ['src/lib/server/forms.ts', '**/*.test.ts'],
		rules: {
			'no-restricted-syntax': [
				'error',
				{
					selector: "CallExpression[callee.property.name='formData']",
					message: 'Read a posted form with readForm() from $lib/server/forms.'
				},
				{
					selector:
						"CallExpression[callee.name='superValidate'][arguments.0.type='MemberExpression'][arguments.0.property.name='request']",
					message: 'Validate a posted form with validateForm() from $lib/server/forms.'
				}
			]
		}
	},
	{
		files: ['**/*.svelte', '**/*.svelte.ts'],
		languageOptions: {
			parserOptions: { parser: ts.parser, extraFileExtensions: ['.svelte'], svelteConfig }
		}
	},
	{
		files: ['**/*.js', '**/*.cjs'],
		...ts.configs.disableTypeChecked
	}
);
