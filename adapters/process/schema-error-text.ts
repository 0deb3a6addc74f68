import type { ErrorObject } from 'ajv';

/**
 * Turns ajv's errors into one sentence that names the JSON path of each problem, e.g.
 * `at /result/values/3: must be number or must be one of "NaN", "Infinity", "-Infinity"`.
 *
 * ajv reports a failed anyOf/oneOf as one error per branch plus the combinator's own error; the
 * branch errors at the same path are the informative part, so they are joined with "or" and the
 * combinator's generic message is kept only when nothing else was said about that path (then the
 * schema's title, which says what was expected, is added).
 */
export function schemaErrorText(errors: readonly ErrorObject[], pathPrefix = ''): string {
  const byPath = new Map<string, ErrorObject[]>();
  for (const error of errors) {
    const path = pathPrefix + error.instancePath;
    const list = byPath.get(path) ?? [];
    list.push(error);
    byPath.set(path, list);
  }
  const parts: string[] = [];
  for (const [path, list] of byPath) {
    const specific = list.filter((e) => e.keyword !== 'anyOf' && e.keyword !== 'oneOf' && e.keyword !== 'if');
    const chosen = specific.length > 0 ? specific : list;
    const messages = [...new Set(chosen.map(errorMessage))];
    parts.push(`at ${path === '' ? '(top level)' : path}: ${messages.join(' or ')}`);
    if (parts.length === 3) break;
  }
  const more = byPath.size > parts.length ? ` (and problems at ${byPath.size - parts.length} more paths)` : '';
  return parts.join('; ') + more;
}

function errorMessage(error: ErrorObject): string {
  switch (error.keyword) {
    case 'enum':
      return `must be one of ${(error.params as { allowedValues: unknown[] }).allowedValues.map((v) => JSON.stringify(v)).join(', ')}`;
    case 'const':
      return `must be ${JSON.stringify((error.params as { allowedValue: unknown }).allowedValue)}`;
    case 'oneOf':
    case 'anyOf': {
      const title = (error.parentSchema as { title?: string } | undefined)?.title;
      return title === undefined ? (error.message ?? error.keyword) : `does not match: ${title}`;
    }
    default:
      return error.message ?? error.keyword;
  }
}
