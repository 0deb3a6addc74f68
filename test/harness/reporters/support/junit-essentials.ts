import { XMLParser, XMLValidator } from 'fast-xml-parser';

type XmlNode = Record<string, unknown>;

/** The document as a general-purpose XML parser reads it: attributes as `@_name`, entities decoded. */
export function parseJunitXml(xml: string): XmlNode {
  return new XMLParser({
    ignoreAttributes: false,
    attributeNamePrefix: '@_',
    parseAttributeValue: false,
    parseTagValue: false,
    trimValues: false,
    // Numeric character references (&#10;) are plain XML; this option makes the parser decode them.
    htmlEntities: true,
    isArray: (name) => ['testsuite', 'testcase', 'property', 'failure', 'error', 'skipped'].includes(name),
  }).parse(xml) as XmlNode;
}

/** Attributes the common JUnit XML schemas allow on each element (Ant's and its widely used extensions). */
const ALLOWED_ATTRIBUTES: Readonly<Record<string, readonly string[]>> = {
  testsuites: ['name', 'tests', 'failures', 'errors', 'skipped', 'disabled', 'time', 'timestamp'],
  testsuite: ['name', 'tests', 'failures', 'errors', 'skipped', 'disabled', 'time', 'timestamp', 'hostname', 'id', 'package', 'file', 'assertions'],
  testcase: ['name', 'classname', 'time', 'status', 'assertions', 'file', 'line'],
  failure: ['message', 'type'],
  error: ['message', 'type'],
  skipped: ['message'],
  property: ['name', 'value'],
};
const ALLOWED_CHILDREN: Readonly<Record<string, readonly string[]>> = {
  testsuites: ['testsuite'],
  testsuite: ['properties', 'testcase', 'system-out', 'system-err'],
  testcase: ['failure', 'error', 'skipped', 'system-out', 'system-err'],
  properties: ['property'],
};

const list = (value: unknown): XmlNode[] => (value === undefined ? [] : Array.isArray(value) ? (value as XmlNode[]) : [value as XmlNode]);
const isCount = (value: unknown) => typeof value === 'string' && /^(0|[1-9]\d*)$/.test(value);

function shape(node: XmlNode, element: string, where: string, problems: string[]): void {
  for (const key of Object.keys(node)) {
    if (key.startsWith('@_')) {
      if (!ALLOWED_ATTRIBUTES[element]?.includes(key.slice(2))) problems.push(`${where}: attribute '${key.slice(2)}' is not in the schema`);
    } else if (key !== '#text' && !ALLOWED_CHILDREN[element]?.includes(key)) {
      problems.push(`${where}: child <${key}> is not in the schema`);
    }
  }
}

function counts(node: XmlNode, cases: readonly XmlNode[], where: string, problems: string[]): void {
  const expected = {
    tests: cases.length,
    failures: cases.filter((c) => c.failure !== undefined).length,
    errors: cases.filter((c) => c.error !== undefined).length,
    skipped: cases.filter((c) => c.skipped !== undefined).length,
  };
  for (const [attribute, value] of Object.entries(expected)) {
    const written = node[`@_${attribute}`];
    if (!isCount(written)) problems.push(`${where}: ${attribute} must be a count, is ${JSON.stringify(written)}`);
    else if (Number(written) !== value) problems.push(`${where}: ${attribute}="${written}" but it holds ${value}`);
  }
}

function testCase(c: XmlNode, where: string, problems: string[]): void {
  shape(c, 'testcase', where, problems);
  for (const attribute of ['classname', 'name']) {
    if (typeof c[`@_${attribute}`] !== 'string' || c[`@_${attribute}`] === '') problems.push(`${where}: needs a non-empty ${attribute}`);
  }
  const outcomes = ['failure', 'error', 'skipped'].filter((k) => c[k] !== undefined);
  if (outcomes.length > 1 || outcomes.some((k) => list(c[k]).length > 1)) problems.push(`${where}: at most one failure, error or skipped element`);
  for (const k of ['failure', 'error', 'skipped'] as const) {
    for (const outcome of list(c[k])) {
      shape(outcome, k, `${where}/${k}`, problems);
      if (k !== 'skipped' && (typeof outcome['@_type'] !== 'string' || typeof outcome['@_message'] !== 'string')) {
        problems.push(`${where}/${k}: needs type and message`);
      }
    }
  }
}

/**
 * Checks a JUnit XML document against the essentials of the common JUnit XML schema: well-formed;
 * a testsuites root of testsuite elements; on every testsuite and on the root, tests, failures,
 * errors and skipped as counts that match the test cases inside; each testcase with a classname and
 * a name and at most one failure (type, message), error (type, message) or skipped; properties of
 * property elements with a name and a value; no attribute or element the schema does not know.
 * Returns the problems found (none for a good document).
 */
export function junitProblems(xml: string): string[] {
  const wellFormed = XMLValidator.validate(xml);
  if (wellFormed !== true) return [`not well-formed: ${wellFormed.err.msg} (line ${wellFormed.err.line})`];
  const document = parseJunitXml(xml);
  const problems: string[] = [];
  const roots = Object.keys(document).filter((k) => k !== '?xml');
  if (roots.length !== 1 || roots[0] !== 'testsuites') return [`the root must be one <testsuites>, found ${roots.join(', ')}`];
  const root = document.testsuites as XmlNode;
  shape(root, 'testsuites', 'testsuites', problems);
  const suites = list(root.testsuite);
  counts(root, suites.flatMap((s) => list(s.testcase)), 'testsuites', problems);
  for (const [i, suite] of suites.entries()) {
    const where = `testsuite[${i}]`;
    shape(suite, 'testsuite', where, problems);
    if (typeof suite['@_name'] !== 'string' || suite['@_name'] === '') problems.push(`${where}: needs a name`);
    const cases = list(suite.testcase);
    counts(suite, cases, where, problems);
    for (const properties of list(suite.properties)) {
      shape(properties, 'properties', `${where}/properties`, problems);
      for (const [k, property] of list(properties.property).entries()) {
        shape(property, 'property', `${where}/property[${k}]`, problems);
        if (typeof property['@_name'] !== 'string' || typeof property['@_value'] !== 'string') problems.push(`${where}/property[${k}]: needs name and value`);
      }
    }
    cases.forEach((c, k) => testCase(c, `${where}/testcase[${k}]`, problems));
  }
  return problems;
}
