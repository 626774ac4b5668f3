/**
 * Proofs in the one store (docs/semantics.md §10): the proof and the comparison run in their worker
 * lanes with progress and cancel, an edit forgets them, and a counterexample goes on the sheet as the
 * shown vector. Jobs run in-process, finished when the test says. Cells are the textbook NAND2
 * (Y = !(A & B), common practice, no source) and the same NAND2 with its PMOS on B missing.
 */
import { describe, expect, it } from 'vitest';
import { readFileSync } from 'node:fs';
import { compareWithCell, compareWithFile, showCounterexample, startProof } from '../../src/state/proof.ts';
import { cancelJob } from '../../src/state/simulation.ts';
import { loadDesign, setDesignFields, store } from '../../src/state/store.ts';
import { design, inverter, nand2, nand2MissingPullUp } from '../cells.ts';
import { runner, settle, useHeldRunner } from './heldRunner.ts';

const state = () => store.getState().simulation;
useHeldRunner();

describe('the proof', () => {
  it('runs on request as a long job (progress bar and cancel) and proves the NAND2', async () => {
    loadDesign(design(nand2, { Y: '!(A & B)' }));
    await settle();
    expect(state().proof.status).toBe('idle');
    void startProof();
    expect(state().proof).toMatchObject({ status: 'running', long: true });
    await settle();
    const report = state().proof.result?.report;
    expect(report?.properties.every((p) => p.holds === true)).toBe(true);
    expect(report?.properties.map((p) => p.property)).toContain('function');
  });

  it('a missing pull-up floats Y at A=1 B=0 only; the counterexample goes on the sheet', async () => {
    loadDesign(design(nand2MissingPullUp, { Y: '!(A & B)' }));
    void startProof();
    await settle();
    const floating = state().proof.result?.report?.properties.find((p) => p.property === 'no-floating');
    expect(floating).toMatchObject({ holds: false, vector: { A: 1, B: 0 } });
    showCounterexample(floating?.vector ?? {});
    expect(state().vector).toEqual({ A: '1', B: '0' });
    expect(state().live?.net('Y')?.level).toBe('Z');
  });

  it('is forgotten when the expected functions change, and can be cancelled', async () => {
    loadDesign(design(nand2, { Y: '!(A & B)' }));
    void startProof();
    await settle();
    setDesignFields({ expectations: { Y: 'A | B' } });
    await settle();
    expect(state().proof.status).toBe('idle');
    void startProof();
    expect(runner.kinds()).toContain('proof');
    cancelJob('proof');
    await settle();
    expect(state().proof.status).toBe('cancelled');
  });
});

describe('the comparison with a cell from a file', () => {
  const library = readFileSync('public/examples/tidewater-cells.sp', 'utf8');

  it('a library asks which cell; a NAND2 equals the library NAND2, and one without its B pull-up differs at A=1 B=0', async () => {
    loadDesign(design(nand2));
    void compareWithFile('tidewater-cells.sp', library);
    await settle();
    expect(state().comparison.result?.choices).toEqual(expect.arrayContaining(['tw_nand2', 'tw_nor2']));
    void compareWithCell('tw_nand2');
    await settle();
    expect(state().comparison.result?.comparison?.equivalent).toBe(true);
    loadDesign(design(nand2MissingPullUp));
    void compareWithFile('tidewater-cells.sp', library);
    await settle();
    void compareWithCell('tw_nand2');
    await settle();
    const c = state().comparison.result?.comparison;
    expect(c).toMatchObject({ equivalent: false, vector: { A: 1, B: 0 } });
    expect(c?.outputs).toEqual({ a: { Y: 'Z' }, b: { Y: '1' } });
  });

  it('pins that differ are refused in words, and an edit forgets the answer', async () => {
    loadDesign(design(inverter));
    void compareWithFile('tidewater-cells.sp', library);
    await settle();
    void compareWithCell('tw_nand2');
    await settle();
    expect(state().comparison.result?.error).toMatch(/inputs differ/);
    loadDesign(design(nand2));
    await settle();
    expect(state().comparison.status).toBe('idle');
  });
});
