import { describe, expect, it } from 'vitest';
import { frequency, parseCheckArgs } from '../../src/cli/args.ts';
import { UsageError } from '../../src/cli/usage.ts';

describe('command-line values', () => {
  // SI prefixes with a hertz unit (k, M, G: BIPM SI brochure, 9th ed., table 7); SPICE numbers
  // without one, where "meg" is 10^6 and "m" is 10^-3 (common practice, no source).
  it.each([
    ['100MHz', 100e6],
    ['100mhz', 100e6],
    ['1.2GHz', 1.2e9],
    ['500kHz', 500e3],
    ['50Hz', 50],
    ['100meg', 100e6],
    ['1e8', 1e8],
  ])('--freq %s is %d Hz', (text, hz) => {
    expect(frequency(text)).toBeCloseTo(hz, 0);
  });
  it('refuses a frequency that is not one', () => {
    expect(() => frequency('fast')).toThrow(UsageError);
  });
  it('takes --load with --sizing alone', () => {
    expect(parseCheckArgs(['cell.sp', '--sizing', '--load', '10f']).load).toBeCloseTo(1e-14, 20);
    expect(() => parseCheckArgs(['cell.sp', '--load', '10f'])).toThrow(
      /--load goes with --power or --sizing/,
    );
  });
});
