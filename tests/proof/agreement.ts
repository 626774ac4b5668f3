import { agreementOf, type Agreement } from '../../bench/proofAgreement.ts';
import { checkSweep } from '../../src/core/analysis/check.ts';
import type { Netlist } from '../../src/core/model/netlist.ts';
import { proveCell, type ProofOptions } from '../../src/core/proof/prove.ts';

export type { Agreement };

/** Proves a cell and checks every answer against its exhaustive sweep (bench/proofAgreement.ts). */
export function agreement(netlist: Netlist, options: ProofOptions = {}): Agreement {
  const proof = proveCell(netlist, options);
  const { technology, expectations } = options;
  const sweep = checkSweep(netlist, {
    ...(technology === undefined ? {} : { technology }),
    ...(expectations === undefined ? {} : { expectations }),
  });
  return agreementOf(netlist, options.expectations, proof, sweep);
}
