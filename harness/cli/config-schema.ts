import { CHECK_OPTIONS, type OptionDeclaration } from './option-table.js';

/** Where a project's config file points its `$schema` when rmt-assay is installed as a dependency. */
export const PUBLISHED_CONFIG_SCHEMA = './node_modules/rmt-assay/dist/harness/cli/schemas/config.schema.json';

type JsonSchema = Record<string, unknown>;

/**
 * The JSON Schema of one option's value in a config file, from its declaration: the option's type;
 * a comma-separated list may also be a JSON array (of numbers or strings), and a list of numbers a
 * single number; a repeatable option a string or an array of strings.
 */
function valueSchema(spec: OptionDeclaration): JsonSchema {
  const described = { description: spec.describe, ...(spec.default === undefined ? {} : { default: spec.default }) };
  if (spec.array === true) {
    return { ...described, anyOf: [{ type: 'string' }, { type: 'array', items: { type: 'string' } }] };
  }
  if (spec.list !== undefined) {
    const item = spec.list === 'number' ? 'integer' : 'string';
    return {
      ...described,
      anyOf: [{ type: 'string' }, ...(spec.list === 'number' ? [{ type: 'integer' }] : []), { type: 'array', items: { type: item }, minItems: 1 }],
    };
  }
  return { ...described, type: spec.type };
}

/**
 * The config file's JSON Schema, derived from the option table: one property per option, nothing
 * else allowed (so a misspelt option is an error with its JSON path, as an unknown flag is).
 * harness/cli/schemas/config.schema.json is this, published; a test keeps the two equal.
 */
export function configSchema(table: Readonly<Record<string, OptionDeclaration>> = CHECK_OPTIONS): JsonSchema {
  return {
    $schema: 'http://json-schema.org/draft-07/schema#',
    $id: 'urn:rmt-assay:schema:config:1',
    title: 'rmt-assay project configuration',
    description:
      'rmt-assay.config.json: the options of `rmt-assay check` (and those of `baseline record` it shares), by their command-line names. ' +
      'Flags override it; `rmt-assay check --print-config` shows the result. Generated from harness/cli/option-table.ts.',
    type: 'object',
    additionalProperties: false,
    properties: {
      $schema: { type: 'string', description: `this schema, e.g. ${PUBLISHED_CONFIG_SCHEMA}` },
      ...Object.fromEntries(Object.entries(table).map(([name, spec]) => [name, valueSchema(spec)])),
    },
  };
}

/** The published file's text: the schema, indented, with a final newline. */
export function configSchemaText(): string {
  return JSON.stringify(configSchema(), null, 2) + '\n';
}
