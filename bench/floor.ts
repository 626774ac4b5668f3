// Indexes read here are in range by construction, so `!` marks them (no run-time cost).
/**
 * The floor: the least work any switch-level solver must do per vector, which is to look at every
 * transistor's gate once. The loop reads each transistor's gate-net level and writes one byte per
 * transistor, nothing else. Solver figures are quoted as a multiple of this.
 */
import { NMOS, PMOS, type CompiledNetlist } from '../src/core/compile/compile.ts';

export interface FloorFrame {
  /** Gate net of each transistor (resistors left out). */
  readonly gates: Int32Array;
  /** One level byte per net. */
  readonly levels: Uint8Array;
  /** One output byte per transistor. */
  readonly out: Uint8Array;
  readonly inputs: Int32Array;
}

export function floorFrame(compiled: CompiledNetlist): FloorFrame {
  const gates: number[] = [];
  for (let c = 0; c < compiled.chCount; c++) {
    if (compiled.chKind[c] === NMOS || compiled.chKind[c] === PMOS) gates.push(compiled.chGate[c]!);
  }
  return {
    gates: Int32Array.from(gates),
    levels: new Uint8Array(compiled.netCount),
    out: new Uint8Array(gates.length),
    inputs: compiled.inputNets,
  };
}

/**
 * Runs `vectors` vectors: sets the input nets from the vector number's bits (so the optimiser cannot
 * hoist the loop), then copies every gate level into the output bytes. Returns a checksum that the
 * caller must consume for the same reason.
 */
export function floorLoop(frame: FloorFrame, vectors: number): number {
  const { gates, levels, out, inputs } = frame;
  const n = gates.length;
  let checksum = 0;
  for (let v = 0; v < vectors; v++) {
    for (let i = 0; i < inputs.length; i++) levels[inputs[i]!] = (v >>> (i % 31)) & 1;
    for (let t = 0; t < n; t++) out[t] = levels[gates[t]!]!;
    checksum = (checksum + out[v % n]!) | 0;
  }
  return checksum;
}
