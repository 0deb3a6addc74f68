import { Ajv, type ErrorObject, type ValidateFunction } from 'ajv';
import schema from './schemas/run-result.schema.json' with { type: 'json' };

/** One way in which a value is not a report: where (a JSON pointer) and what is wrong. */
export interface ReportProblem {
  readonly path: string;
  readonly message: string;
}

let validate: ValidateFunction | undefined;

function validator(): ValidateFunction {
  // strictRequired off: the verdict's `if state … then required […]` names properties declared
  // beside the `if`, not inside the `then`, which is how draft-07 expresses a conditional field.
  validate ??= new Ajv({ allErrors: true, strict: true, strictRequired: false }).compile(schema);
  return validate;
}

function problemOf(error: ErrorObject): ReportProblem {
  const params = error.params as { additionalProperty?: string; allowedValues?: unknown[]; allowedValue?: unknown };
  const detail =
    params.additionalProperty !== undefined
      ? ` ('${params.additionalProperty}')`
      : params.allowedValues !== undefined
        ? ` (${params.allowedValues.map((v) => JSON.stringify(v)).join(', ')})`
        : params.allowedValue !== undefined
          ? ` (${JSON.stringify(params.allowedValue)})`
          : '';
  return { path: error.instancePath === '' ? '/' : error.instancePath, message: `${error.message ?? error.keyword}${detail}` };
}

/**
 * Checks a parsed JSON report against the published schema (schemas/run-result.schema.json,
 * draft-07). Returns every problem with its JSON pointer; an empty list means the value is a
 * valid report. The schema is imported as a JSON module so the source and dist/ find it alike.
 */
export function validateRunResultJson(value: unknown): ReportProblem[] {
  const check = validator();
  if (check(value)) return [];
  // An `if` error only says which `then` failed; the error it points to is listed beside it.
  return (check.errors ?? []).filter((e) => e.keyword !== 'if').map(problemOf);
}
