import { evidenceLines } from '../reporters/evidence-lines.js';
import type { RunResult } from '../run-result.js';
import type { CheckVerdict } from '../verdict.js';

function verdictLines(v: CheckVerdict): string[] {
  const label = v.state === 'fail' ? 'FAILED' : 'FAULT ';
  const body = v.state === 'fail' ? evidenceLines(v) : [`reason     ${v.reason ?? ''}`];
  return [`${label} ${v.id}`, `  ${v.title}`, ...body.map((line) => `  ${line}`), ...(v.path ? [`  path       ${v.path}`] : []), `  replay     ${v.replay}`, ''];
}

/**
 * Why a run does not conform, for a test runner's failure output: a headline with the counts and
 * the level, then each failed or faulted check with what was observed and expected, the error bar
 * or ratio, where the data came from and the command that replays it. Null when the run conforms
 * (no failure or fault, and at least one check passed).
 */
export function conformanceFailureMessage(result: RunResult): string | null {
  const verdicts = result.suites.flatMap((s) => s.checks);
  const bad = verdicts.filter((v) => v.state === 'fail' || v.state === 'fault');
  const { pass, fail, fault, skipped } = result.counts;
  const who = `${result.adapter.name} ${result.adapter.version}`;
  if (bad.length === 0 && pass > 0) return null;
  if (bad.length === 0) {
    const reasons = [...new Set(verdicts.map((v) => v.reason ?? ''))].filter((r) => r !== '');
    return `rmt-assay: no check of ${who} ran (${skipped} skipped): ${reasons.join('; ') || 'the suites planned no checks'}`;
  }
  const headline =
    `rmt-assay: ${who} does not conform: ${fail} of ${verdicts.length} checks failed, ${fault} faulted ` +
    `(statistical checks under Holm's family-wise control at level ${result.falseAlarmControl.level}; seed ${result.settings.seed})`;
  return [headline, '', ...bad.flatMap(verdictLines)].join('\n').trimEnd();
}
