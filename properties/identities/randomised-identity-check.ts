import fc from 'fast-check';
import type { Capability } from '../../adapters/adapter.js';
import type { CheckContext, CheckFinding, CheckGroup } from '../../harness/check-group.js';
import type { DeterministicEvidence } from '../../harness/evidence.js';
import { ensembleLabel } from '../../harness/numeric/ensemble.js';
import type { RunSettings } from '../../harness/run-settings.js';
import { runSizesForCases } from './matrix-case.js';

/**
 * One deterministic check of the identities suite, run as a fast-check property over random
 * cases (a matrix, spectral parameters, weights). `evaluate` computes the check's evidence for one
 * case: a normalised ratio against the threshold; the property holds when the ratio is within it.
 */
export interface RandomisedIdentity<Case extends object> {
  readonly id: string;
  readonly title: string;
  /** Capabilities the check cannot run without. */
  readonly needs: readonly Capability[];
  readonly arbitrary: fc.Arbitrary<Case>;
  /** The case in readable, replayable form: N, ensemble, stream index, z's, weights. */
  describe(c: Case): string;
  /** Where the matrix and the compared quantities came from, for the verdict's `path`. */
  path(capabilities: ReadonlySet<Capability>): string;
  evaluate(context: CheckContext, c: Case): Promise<DeterministicEvidence>;
}

/** Cases per property with the default settings (samples 300). */
export const DEFAULT_IDENTITY_RUNS = 60;

/**
 * Cases per property: the run's `samples` / 5, within [20, 500], so the default of 300 samples
 * gives 60 cases and `--samples` scales the search as it scales the statistical checks' effort.
 */
export function identityRuns(settings: RunSettings): number {
  return Math.min(500, Math.max(20, Math.round(settings.samples / 5)));
}

interface Tried<Case> {
  readonly c: Case;
  readonly evidence: DeterministicEvidence;
}

/**
 * The check as a group of its own (one check per group, so `--only` keeps or drops it whole).
 *
 * Running: `fc.check(fc.asyncProperty(arbitrary, …), { seed, numRuns })` with the seed drawn from
 * the run's seed and the check's id. A failure is shrunk by fast-check to the smallest case it
 * finds; the verdict then carries that case's evidence, its description with fast-check's seed and
 * path, and the path as `replayCase`. A pass carries the worst ratio over all cases tried.
 *
 * Replay: when `settings.replayCase` is set and `settings.only` names this check, exactly that case
 * runs: `fc.check(property, { seed, path, endOnFailure: true })`, evaluating only the first value
 * the path leads to (the case itself; fast-check would otherwise walk on to its shrink siblings).
 *
 * An exception from `evaluate` (an AdapterFault, or a harness error) is not a counterexample: the
 * first one is recorded, every later case rethrows it without calling the implementation (so
 * fast-check's shrinking costs nothing), and it is rethrown from `run`, which the engine turns into
 * a fault of this check.
 */
export function randomisedIdentityGroup<Case extends object>(check: RandomisedIdentity<Case>, settings: RunSettings): CheckGroup {
  const runs = identityRuns(settings);
  return {
    id: check.id,
    suite: 'identities',
    checks: [{ id: check.id, title: check.title, parameters: { runs, sizes: sizeText(settings), ensembles: settings.ensembles.map(ensembleLabel).join(',') } }],
    skipReason(capabilities) {
      const missing = check.needs.filter((c) => !capabilities.has(c));
      return missing.length === 0 ? null : `the implementation does not offer ${missing.join(' and ')}`;
    },
    async run(context): Promise<CheckFinding[]> {
      // fast-check's own generator is seeded from the run's seed through a stream of its own.
      const seed = context.stream(`${check.id}/fast-check-seed`, 0).nextUint32() | 0;
      const replaying = settings.replayCase !== '' && settings.only.includes(check.id);
      let fault: { readonly error: unknown } | undefined;
      let evaluated = 0;
      let worst: Tried<Case> | undefined;
      const failures = new WeakMap<Case, DeterministicEvidence>();
      const property = fc.asyncProperty(check.arbitrary, async (c) => {
        if (fault !== undefined) throw fault.error;
        if (replaying && evaluated > 0) return true;
        evaluated++;
        let evidence: DeterministicEvidence;
        try {
          evidence = await check.evaluate(context, c);
        } catch (error) {
          fault = { error };
          throw error;
        }
        if (worst === undefined || !(evidence.ratio <= worst.evidence.ratio)) worst = { c, evidence };
        const holds = evidence.ratio <= evidence.threshold;
        if (!holds) failures.set(c, evidence);
        return holds;
      });
      const details = await fc.check(
        property,
        replaying ? { seed, path: settings.replayCase, endOnFailure: true } : { seed, numRuns: runs },
      );
      if (fault !== undefined) throw fault.error;
      const path = check.path(context.capabilities);
      if (details.failed && details.counterexample !== null) {
        const [c] = details.counterexample;
        const evidence = failures.get(c) ?? (await check.evaluate(context, c));
        const replay = `fast-check seed ${details.seed}, path ${details.counterexamplePath} (--only ${check.id} --case ${details.counterexamplePath})`;
        const how = replaying ? 'replayed case' : `counterexample shrunk ${details.numShrinks} time(s) after ${details.numRuns} case(s)`;
        return [
          {
            state: 'measured',
            path,
            evidence: { ...evidence, worstInput: `${how}: ${check.describe(c)}; ${replay}` },
            replayCase: details.counterexamplePath ?? undefined,
          },
        ];
      }
      if (worst === undefined) throw new Error(`${check.id}: fast-check tried no case`);
      const tried = replaying ? `replayed case (path ${settings.replayCase})` : `worst of ${evaluated} case(s)`;
      return [
        {
          state: 'measured',
          path,
          evidence: { ...worst.evidence, worstInput: `${tried}: ${check.describe(worst.c)}; fast-check seed ${details.seed}` },
        },
      ];
    },
  };
}

function sizeText(settings: RunSettings): string {
  const run = runSizesForCases(settings);
  return run.length === 0 ? '2–40' : `2–40, ${run.join(', ')}`;
}
