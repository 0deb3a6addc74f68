import type { ComparedSide, ComparisonResult } from '../compare/comparison-result.js';
import { shortNumber } from './format-quantity.js';
import { formatTerminalSummary, type TerminalStyle } from './terminal-reporter.js';

function side(role: string, s: ComparedSide): string {
  return `  ${role.padEnd(6)} ${s.name} ${s.version} (${s.kind}) · offers ${s.capabilities.join(', ') || 'nothing'} · ${s.specification}`;
}

function table(rows: readonly string[][]): string[] {
  const widths = rows[0].map((_, c) => Math.max(...rows.map((r) => r[c].length)));
  return rows.map((r) => `  ${r.map((cell, c) => cell.padEnd(widths[c])).join('  ')}`.trimEnd());
}

/**
 * What `compare` prints: the two sides, the agreement of each routine on the same matrices
 * (largest relative difference, digits of agreement, worst ratio against its threshold), then the
 * run summary (failed checks with evidence and replay commands, skips, counts), then which checks
 * tell the two apart.
 */
export function formatComparisonSummary(result: ComparisonResult, style: TerminalStyle): string {
  const { left, right, agreement, distinguishing } = result.comparison;
  const lines = ['', 'rmt-assay compare', side('left', left), side('right', right), ''];
  if (agreement.length > 0) {
    lines.push('Agreement on the same matrices (harness-drawn probe set):');
    lines.push(
      ...table([
        ['routine', 'ensemble', 'N', 'matrices', 'max rel. diff', 'digits', 'ratio / threshold', ''],
        ...agreement.map((a) => [
          a.routine,
          a.ensemble,
          String(a.size),
          String(a.inputs),
          shortNumber(a.maxRelativeDifference),
          a.digits.toFixed(1),
          `${shortNumber(a.ratio)} / ${a.threshold}`,
          a.state === 'pass' ? 'agree' : 'DIFFER',
        ]),
      ]),
    );
  }
  lines.push(formatTerminalSummary(result, style).replace(/\n+$/, ''));
  lines.push(
    distinguishing.length === 0
      ? 'Nothing distinguishes the two at these sizes, samples and seed.'
      : `Distinguished by ${distinguishing.length} check${distinguishing.length === 1 ? '' : 's'}: ${distinguishing.join(', ')}`,
    '',
  );
  return lines.join('\n');
}
