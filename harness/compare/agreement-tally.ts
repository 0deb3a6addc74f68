import { agreementDigits } from './agreement-digits.js';
import type { InputAgreement } from './input-agreement.js';

/**
 * The agreement of one routine over many inputs: the worst input by ratio (kept whole, for the
 * verdict and its replay), the largest relative difference and the fewest digits of agreement.
 */
export class AgreementTally {
  private worstSeen: InputAgreement | undefined;
  private largestRelative = 0;
  private inputs = 0;

  add(agreement: InputAgreement): void {
    this.inputs++;
    if (this.worstSeen === undefined || !(agreement.ratio <= this.worstSeen.ratio)) this.worstSeen = agreement;
    if (!(agreement.relativeDifference <= this.largestRelative)) this.largestRelative = agreement.relativeDifference;
  }

  get count(): number {
    return this.inputs;
  }

  get worst(): InputAgreement {
    if (this.worstSeen === undefined) throw new RangeError('AgreementTally: no input compared');
    return this.worstSeen;
  }

  get maxRelativeDifference(): number {
    return this.largestRelative;
  }

  /** The LRE of the worst relative difference: the fewest digits on which the two agree. */
  get digits(): number {
    return agreementDigits(this.largestRelative);
  }
}
