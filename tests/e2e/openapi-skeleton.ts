// Reading /api/v1/openapi.json for the fuzzer: the operation of a concrete path, its query
// parameters, and a skeleton body (every property, one item per list, the first choice) whose
// values the fuzzer then replaces.

export interface OpenApi {
	paths: Record<string, Record<string, OpenApiOperation>>;
	components: { schemas: Record<string, JsonSchema> };
}

export interface OpenApiOperation {
	parameters?: { in: string; name: string }[];
	requestBody?: { content?: Record<string, { schema?: JsonSchema }> };
}

export interface JsonSchema {
	$ref?: string;
	type?: string | string[];
	properties?: Record<string, JsonSchema>;
	items?: JsonSchema;
	enum?: unknown[];
	const?: unknown;
	format?: string;
	anyOf?: JsonSchema[];
	oneOf?: JsonSchema[];
	allOf?: JsonSchema[];
	default?: unknown;
}

/** The OpenAPI path template of a concrete /api/v1 path, with every id as {}. */
function template(path: string): string {
	return path
		.split('?')[0]!
		.replace(/^\/api\/v1/, '')
		.replace(/\/[0-9a-f-]{36}/g, '/{}');
}

export function operation(spec: OpenApi, path: string, method: string) {
	const wanted = template(path);
	const entry = Object.entries(spec.paths).find(([p]) => p.replace(/\{[^}]+\}/g, '{}') === wanted);
	return entry?.[1][method.toLowerCase()];
}

export function requestSchema(op: OpenApiOperation | undefined): JsonSchema | undefined {
	return op?.requestBody?.content?.['application/json']?.schema;
}

export function skeleton(spec: OpenApi, schema: JsonSchema | undefined, depth = 0): unknown {
	if (!schema || depth > 6) return null;
	if (schema.$ref) {
		return skeleton(spec, spec.components.schemas[schema.$ref.split('/').pop()!], depth + 1);
	}
	if (schema.default !== undefined) return schema.default;
	if (schema.const !== undefined) return schema.const;
	if (schema.enum) return schema.enum[0];
	const choice = schema.anyOf ?? schema.oneOf;
	if (choice) return skeleton(spec, choice[choice.length - 1], depth + 1);
	if (schema.allOf) {
		return Object.assign({}, ...schema.allOf.map((s) => skeleton(spec, s, depth + 1)));
	}
	const type = Array.isArray(schema.type) ? schema.type[0] : schema.type;
	if (type === 'object' || schema.properties) {
		return Object.fromEntries(
			Object.entries(schema.properties ?? {}).map(([k, s]) => [k, skeleton(spec, s, depth + 1)])
		);
	}
	if (type === 'array') return [skeleton(spec, schema.items, depth + 1)];
	if (type === 'integer' || type === 'number') return 1;
	if (type === 'boolean') return false;
	if (schema.format === 'uuid') return '00000000-0000-4000-8000-000000000000';
	if (schema.format === 'date') return '2026-12-01';
	return 'x';
}
