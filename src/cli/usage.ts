/** Help texts and the error for unusable arguments (exit status 2). */
import { CAUTION } from '../core/caution.ts';
import { VIH_FRACTION, VIL_FRACTION } from '../core/model/technology.ts';
import { DEFAULT_POWER_SETTINGS } from '../core/power/settings.ts';
import { formatSi } from './colour.ts';

export class UsageError extends Error {
  override readonly name = 'UsageError';
}

export const EXIT_OK = 0;
export const EXIT_FINDINGS = 1;
export const EXIT_UNUSABLE = 2;

export const MAIN_HELP = `railwise: switch-level checks of CMOS cells from the command line

Usage:
  railwise check FILE... [options]     check cells: levels, current paths, findings
  railwise compare FILE_A FILE_B       prove two cells give the same outputs for every vector
  railwise export FILE --to FORMAT     write a cell as spice, verilog or csv
  railwise help [check|compare|export] show help

FILE is a Railwise design file (.json) or a SPICE-compatible netlist (.sp .spi .spice .cir .net .cdl .ckt).
Exit status: 0 no errors (every property proved, the cells equivalent), 1 error findings (a
property fails or is undecided, the cells differ), 2 unusable input or arguments.

${CAUTION}
`;

export const CHECK_HELP = `railwise check FILE... [options]

Checks every input vector of each cell (or a sequence of vectors) and reports output levels,
supply-to-ground current paths and findings. A file with several top-level subcircuits that nothing
instantiates is a library: each subcircuit that holds devices is checked as its own cell.

Pins and expectations (one cell: a single-cell file, or a library with --cell):
  --inputs A,B          input pins, in truth-table order (default: ports that only reach gates,
                        and ports an --expect reads without describing)
  --outputs Y           output pins (default: the other ports that are not rails)
  --expect "Y = EXPR"   expected function, repeatable: ! & | ^ ( ) 0 1, S ? A : B, and Z
  --sequence STEPS      apply these steps in order, carrying stored charge, instead of the sweep:
                        "A=0 B=1; A=1" (steps split by ; or line breaks, "-" changes nothing),
                        or the name of a sequence saved in a design file
  --cell NAME           check only this cell: any subcircuit the file defines
  --functions-from LIB  check each cell against the function and three_state attributes of the
                        Liberty file LIB (pins and power rails from it too; sequential cells skipped)

Circuit:
  --vdd V               supply voltage (thresholds follow at ${VIL_FRACTION} and ${VIH_FRACTION} of VDD)
  --supply NAMES        extra supply rail net names, comma separated
  --ground NAMES        extra ground rail net names, comma separated
  --undriven            also leave each input undriven (Z) in the sweep
  --max-inputs N        sweep cells of up to N inputs (default 16, at most 24: 16,777,216
                        vectors); wider cells are checked with --sequence

Netlists:
  --scale F             metres per unit of W and L as written (e.g. 1e-6), over the file's own
  --treat-as NAME=KIND  read instances of the undefined subcircuit NAME as nmos, pmos, diode or
                        short (repeatable, or comma separated)
  --top-only            in a library, check only the subcircuits that nothing instantiates

Report:
  --json                print one JSON object (a "cells" list for a library)
  --all-nets            report every net's voltage, not only the outputs'
  --power               add static and dynamic power
    --freq F            clock frequency, e.g. 100MHz, 100meg or 1e8 (default ${formatSi(DEFAULT_POWER_SETTINGS.frequency, 'Hz')})
    --activity KIND     sequence or random (default: sequence with --sequence, else random)
    --load C            load on each output, also for --sizing, e.g. 10f (default ${formatSi(DEFAULT_POWER_SETTINGS.load, 'F')})
  --sizing              add logical effort, delay estimates and proposed widths
  --found               add the function each output computes, read off the sweep, as a minimal
                        sum of products ("Y = !A | !B"; "(EN) ? (!A) : Z" for a tristate one)
  --transfer IN         add the DC transfer curve of every output as IN goes from 0 to VDD, with
                        VM, VIL, VIH, VOL, VOH and the noise margins (level-1 model; one cell)
    --hold "B=1 C=0"    values of the other inputs (default: chosen so an output follows IN)
    --convention KIND   unity-gain (VOL/VOH at the unity-gain points, default) or rails
                        (VOL/VOH with the input at 0 and VDD)
    --points N          input steps from 0 to VDD inclusive (default 201)
  --dc                  add each vector's level-1 DC voltages and supply current beside the
                        switch-level estimate
  --prove               prove, for all 2^n input vectors at once (SAT), that each output follows
                        its expected function, never floats, never is X and never arrives
                        degraded, and that no vector draws static current or makes a contention;
                        each failure comes with a counterexample replayed in the engine. Past the
                        exhaustive limit the sweep is skipped and only the proof runs. Cells with
                        feedback (latches) are out of scope: their properties stay undecided.
  --jobs N              worker threads for large libraries (default: one per core when it pays)

Exit status: 0 no error findings (and, with --prove, every property proved), 1 error findings
(or a property fails or is undecided), 2 unusable input or arguments.
`;

export const COMPARE_HELP = `railwise compare FILE_A FILE_B [options]

Proves that two cells with the same input and output pins give every output the same level (0, 1,
X or Z) for every 0/1 input vector, or prints a vector where they differ with both cells' levels,
replayed in the engine. Cells with feedback (latches) are out of scope.

Options:
  --cell-a NAME         the cell of FILE_A, when it is a library
  --cell-b NAME         the cell of FILE_B, when it is a library
  --json                print {equivalent, vector, outputs: {a, b}, seconds}
  --vdd, --supply, --ground, --scale, --treat-as   read both files as for check

Exit status: 0 equivalent, 1 the cells differ (or it could not be decided), 2 unusable input or
arguments (pins that differ included).
`;

export const EXPORT_HELP = `railwise export FILE --to spice|verilog|csv [options]

Writes one cell to standard output:
  spice     a .subckt with W and L and level-1 model cards from the technology
  verilog   structural Verilog with the IEEE Std 1364 switch primitives
  csv       the truth table (every input vector) per RFC 4180

Options: --cell NAME (a cell of a library), --inputs, --outputs, --expect, --vdd, --supply,
--ground, --sequence (csv of the steps instead of the sweep), as for check.
`;
