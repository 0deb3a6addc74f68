import { readFileSync } from 'node:fs';
import { Ajv, type ValidateFunction } from 'ajv';
import { schemaErrorText } from '../../adapters/process/schema-error-text.js';
import { parseEnsemble } from '../numeric/ensemble.js';
import type { BaselineFile } from './baseline-file.js';
import schema from './baseline.schema.json' with { type: 'json' };

/** A baseline file that cannot be used: missing, not JSON, or not of the published schema. */
export class BaselineError extends Error {
  override readonly name = 'BaselineError';
}

let validator: ValidateFunction | undefined;

/**
 * Validates parsed JSON against baseline.schema.json (ajv), then what a schema cannot say: every
 * ensemble parses, every output and statistic names an ensemble and size the baseline lists.
 * Errors name the file and the JSON path of the problem.
 */
export function validateBaseline(value: unknown, file: string): BaselineFile {
  validator ??= new Ajv({ allErrors: false, verbose: true, strict: true }).compile(schema);
  if (!validator(value)) throw new BaselineError(`baseline ${file} ${schemaErrorText(validator.errors ?? [])}`);
  const baseline = value as BaselineFile;
  baseline.ensembles.forEach((label, i) => {
    try {
      parseEnsemble(label);
    } catch (error) {
      throw new BaselineError(`baseline ${file} at /ensembles/${i}: ${(error as Error).message}`);
    }
  });
  const listed = (where: string, entry: { ensemble: string; size: number }) => {
    if (!baseline.ensembles.includes(entry.ensemble)) throw new BaselineError(`baseline ${file} at ${where}/ensemble: '${entry.ensemble}' is not in /ensembles`);
    if (!baseline.sizes.includes(entry.size)) throw new BaselineError(`baseline ${file} at ${where}/size: ${entry.size} is not in /sizes`);
  };
  baseline.outputs.forEach((o, i) => {
    listed(`/outputs/${i}`, o);
    if (o.matrix >= baseline.inputs.matricesPerCase) {
      throw new BaselineError(`baseline ${file} at /outputs/${i}/matrix: ${o.matrix} is beyond /inputs/matricesPerCase (${baseline.inputs.matricesPerCase})`);
    }
  });
  baseline.statistics.forEach((s, i) => listed(`/statistics/${i}`, s));
  baseline.inputs.chains.forEach((c, i) => {
    if (c.points.length !== c.weights.length) {
      throw new BaselineError(`baseline ${file} at /inputs/chains/${i}: ${c.points.length} points but ${c.weights.length} weights`);
    }
  });
  return baseline;
}

/** Reads and validates a baseline file. */
export function loadBaseline(file: string): BaselineFile {
  let text: string;
  try {
    text = readFileSync(file, 'utf8');
  } catch (error) {
    throw new BaselineError(`cannot read baseline ${file}: ${(error as NodeJS.ErrnoException).code ?? (error as Error).message}`);
  }
  let value: unknown;
  try {
    value = JSON.parse(text);
  } catch (error) {
    throw new BaselineError(`baseline ${file} is not JSON: ${(error as Error).message}`);
  }
  return validateBaseline(value, file);
}
