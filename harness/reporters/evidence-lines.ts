import type { CheckVerdict } from '../verdict.js';
import { shortNumber, shortQuantity } from './format-quantity.js';

/**
 * The evidence of a check as labelled lines (label padded to ten characters, no indent): what was
 * observed and expected, the source, the error bar and the allowance, or the ratio and its
 * threshold. `once` lets a caller print a long shared text (a source, a method) only the first
 * time and refer back to it afterwards; by default every text is printed in full.
 */
export function evidenceLines(v: CheckVerdict, once: (text: string) => string = (text) => text): string[] {
  const e = v.evidence;
  if (e === undefined) return [];
  if (e.kind === 'statistical') {
    return [
      `observed   ${shortQuantity(e.observed, 8)}`,
      `expected   ${shortQuantity(e.expected, 8)}`,
      `source     ${once(e.expectedSource)}`,
      `error bar  ±${shortQuantity(e.standardError, 3)} (${once(e.standardErrorMethod)})`,
      `allowance  ${shortNumber(e.allowance)} (${once(e.allowanceReason)})`,
      `excess     ${shortNumber(e.zScore)} standard errors beyond the allowance; p = ${shortNumber(e.pValue)}, Holm-adjusted ${shortNumber(v.adjustedPValue ?? NaN)}`,
      ...(e.detectableRelativeError === undefined
        ? []
        : [`power      detects a relative error of ${shortNumber(e.detectableRelativeError)} or more with probability 0.8 at its share of the level`]),
    ];
  }
  return [
    `observed   ${shortQuantity(e.observed, 12)}`,
    `expected   ${shortQuantity(e.expected, 12)}`,
    `source     ${once(e.expectedSource)}`,
    `ratio      ${shortNumber(e.ratio)} against threshold ${e.threshold} (${once(e.toleranceReason)})`,
    ...(e.worstInput ? [`input      ${e.worstInput}`] : []),
  ];
}
