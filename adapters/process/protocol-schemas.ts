import { Ajv, type ValidateFunction } from 'ajv';
import chain from './schemas/chain.json' with { type: 'json' };
import chainTraceParams from './schemas/chain_trace.params.json' with { type: 'json' };
import chainTraceResult from './schemas/chain_trace.result.json' with { type: 'json' };
import complexPoint from './schemas/complex-point.json' with { type: 'json' };
import complexValue from './schemas/complex-value.json' with { type: 'json' };
import covarianceParams from './schemas/covariance.params.json' with { type: 'json' };
import covarianceResult from './schemas/covariance.result.json' with { type: 'json' };
import describeParams from './schemas/describe.params.json' with { type: 'json' };
import describeResult from './schemas/describe.result.json' with { type: 'json' };
import eigenvaluesParams from './schemas/eigenvalues.params.json' with { type: 'json' };
import eigenvaluesResult from './schemas/eigenvalues.result.json' with { type: 'json' };
import ensemble from './schemas/ensemble.json' with { type: 'json' };
import errorObject from './schemas/error-object.json' with { type: 'json' };
import matrix from './schemas/matrix.json' with { type: 'json' };
import realValue from './schemas/real-value.json' with { type: 'json' };
import request from './schemas/request.json' with { type: 'json' };
import resolventTraceParams from './schemas/resolvent_trace.params.json' with { type: 'json' };
import resolventTraceResult from './schemas/resolvent_trace.result.json' with { type: 'json' };
import response from './schemas/response.json' with { type: 'json' };
import sampleParams from './schemas/sample.params.json' with { type: 'json' };
import sampleResult from './schemas/sample.result.json' with { type: 'json' };
import sampleStatisticsParams from './schemas/sample_statistics.params.json' with { type: 'json' };
import sampleStatisticsResult from './schemas/sample_statistics.result.json' with { type: 'json' };
import { schemaErrorText } from './schema-error-text.js';

/**
 * The JSON Schemas of the process protocol (schemas/*.json, documented in PROTOCOL.md), compiled
 * with ajv on first use. The schema files are imported as modules so that the compiled code in
 * dist/ and the TypeScript source run by vitest find them the same way.
 *
 * To add a method: write METHOD.params.json and METHOD.result.json, import them here and add a row
 * to METHOD_SCHEMAS; shared pieces go into SHARED_SCHEMAS and are referenced by their $id.
 */
const SHARED_SCHEMAS = [matrix, realValue, complexValue, complexPoint, ensemble, errorObject, chain];

const METHOD_SCHEMAS = {
  describe: { params: describeParams, result: describeResult },
  eigenvalues: { params: eigenvaluesParams, result: eigenvaluesResult },
  resolvent_trace: { params: resolventTraceParams, result: resolventTraceResult },
  chain_trace: { params: chainTraceParams, result: chainTraceResult },
  sample: { params: sampleParams, result: sampleResult },
  covariance: { params: covarianceParams, result: covarianceResult },
  sample_statistics: { params: sampleStatisticsParams, result: sampleStatisticsResult },
} as const;

/** The methods of the protocol, by their wire names. */
export type ProtocolMethod = keyof typeof METHOD_SCHEMAS;

export const PROTOCOL_METHODS = Object.keys(METHOD_SCHEMAS) as ProtocolMethod[];

export function isProtocolMethod(name: string): name is ProtocolMethod {
  return Object.hasOwn(METHOD_SCHEMAS, name);
}

interface CompiledSchemas {
  readonly request: ValidateFunction;
  readonly response: ValidateFunction;
  readonly params: Record<ProtocolMethod, ValidateFunction>;
  readonly result: Record<ProtocolMethod, ValidateFunction>;
}

let compiled: CompiledSchemas | undefined;

/** Compiles every schema now (it happens on first use otherwise); throws if one is invalid. */
export function compileProtocolSchemas(): void {
  schemas();
}

function schemas(): CompiledSchemas {
  if (compiled !== undefined) return compiled;
  // verbose: errors carry their schema, whose title names what a failed anyOf/oneOf expected.
  // strictRequired is off: the oneOf branches of response.json require members that the parent
  // schema defines, which is correct JSON Schema that ajv's strict mode would reject.
  const ajv = new Ajv({ allErrors: false, verbose: true, strict: true, strictRequired: false });
  for (const schema of SHARED_SCHEMAS) ajv.addSchema(schema);
  const params = {} as Record<ProtocolMethod, ValidateFunction>;
  const result = {} as Record<ProtocolMethod, ValidateFunction>;
  for (const method of PROTOCOL_METHODS) {
    params[method] = ajv.compile(METHOD_SCHEMAS[method].params);
    result[method] = ajv.compile(METHOD_SCHEMAS[method].result);
  }
  compiled = { request: ajv.compile(request), response: ajv.compile(response), params, result };
  return compiled;
}

/** Why `value` is not a valid message, with JSON paths below `pathPrefix`; undefined when valid. */
function problemOf(validate: ValidateFunction, value: unknown, pathPrefix: string): string | undefined {
  return validate(value) ? undefined : schemaErrorText(validate.errors ?? [], pathPrefix);
}

/** Checks a JSON-RPC response envelope (response.json), not its result. */
export function responseEnvelopeProblem(value: unknown): string | undefined {
  return problemOf(schemas().response, value, '');
}

/** Checks the result of `method` (METHOD.result.json); paths read /result/… unless another prefix is given. */
export function resultProblem(method: ProtocolMethod, result: unknown, pathPrefix = '/result'): string | undefined {
  return problemOf(schemas().result[method], result, pathPrefix);
}

/** Checks the params of `method` (METHOD.params.json), with paths below `pathPrefix`. */
export function paramsProblem(method: ProtocolMethod, params: unknown, pathPrefix: string): string | undefined {
  return problemOf(schemas().params[method], params, pathPrefix);
}

/** Checks a whole request (request.json) and its params (METHOD.params.json). */
export function requestProblem(message: unknown): string | undefined {
  const envelope = problemOf(schemas().request, message, '');
  if (envelope !== undefined) return envelope;
  const { method, params } = message as { method: string; params?: unknown };
  if (!isProtocolMethod(method)) return `at /method: unknown method ${JSON.stringify(method)}`;
  return problemOf(schemas().params[method], params ?? {}, '/params');
}
