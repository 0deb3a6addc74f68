import { describe, expect, it } from 'vitest';
import { parseAdapterSpecification } from '../../../harness/cli/adapter-specification.js';
import { UsageError } from '../../../harness/cli/usage-error.js';

describe('parseAdapterSpecification', () => {
  it('reads each kind into the choice open-adapter.ts opens', () => {
    expect(parseAdapterSpecification('left', 'reference', 5)).toEqual({ timeoutSeconds: 5 });
    expect(parseAdapterSpecification('left', 'module:./kernel.mjs', 5)).toEqual({ module: './kernel.mjs', timeoutSeconds: 5 });
    expect(parseAdapterSpecification('left', 'recorded:answers.json', 5)).toEqual({ recorded: 'answers.json', timeoutSeconds: 5 });
  });

  it('keeps everything after the first colon of a command, colons and spaces included', () => {
    expect(parseAdapterSpecification('right', 'exec:python3 -c "import a: b" --x=1', 9)).toEqual({ exec: 'python3 -c "import a: b" --x=1', timeoutSeconds: 9 });
  });

  const bad: Array<[string, RegExp]> = [
    ['kernel.mjs', /--left must name an implementation as reference, module:FILE, exec:COMMAND or recorded:FILE, got 'kernel.mjs'/],
    ['python:lab.py', /--left must name an implementation/],
    ['module:', /--left module: needs a file after the colon/],
    ['exec:  ', /--left exec: needs a command after the colon/],
    ['', /--left must name an implementation/],
  ];
  for (const [text, message] of bad) {
    it(`refuses '${text}' with a usage error`, () => {
      expect(() => parseAdapterSpecification('left', text, 5)).toThrow(UsageError);
      expect(() => parseAdapterSpecification('left', text, 5)).toThrow(message);
    });
  }
});
