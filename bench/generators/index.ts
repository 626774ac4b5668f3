export { inverterChain } from './inverterChain.ts';
export { mirrorFullAdder, rippleAdder, rippleAdderDevices } from './mirrorAdder.ts';
export { muxTree } from './muxTree.ts';
export { ratioedDecoder } from './ratioedDecoder.ts';
export { adderBank, rotateLeft } from './adderBank.ts';
export { transistorCount } from './parts.ts';
export { ao222, nandGate } from './staticGates.ts';
