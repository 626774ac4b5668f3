/**
 * A design of several cells survives SPICE export → import exactly, whatever its names: every cell
 * with its own devices, rails, pins, instances (names, placed cell, wiring, unwired pins) and
 * expected functions, and the technology's model cards. No name can add a statement to the SPICE or
 * the Verilog of a design. Our own format's behaviour: no published source applies; the SPICE rules
 * followed are the usual ones (`*` comment, `+` continuation, `.` command, names compared without
 * case; common practice, no source); Verilog is read with IEEE Std 1364-2005 clause 3 (3.3
 * comments, 3.7 identifiers, 3.7.1 escaped identifiers) and 12.3.6 (ports connected by name).
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import type { Cell, Design } from '../../src/core/document/design.ts';
import { exportSpiceDesign } from '../../src/core/netlist-io/spiceDesignExport.ts';
import { designFromImport } from '../../src/core/netlist-io/spiceDesign.ts';
import { importSpice } from '../../src/core/netlist-io/spiceImport.ts';
import { exportVerilogDesign } from '../../src/core/netlist-io/verilogDesignExport.ts';
import { DEFAULT_TECHNOLOGY, MODEL_FIELDS, technologyValue } from '../../src/core/model/technology.ts';
import { hasControlCharacter } from '../fixtures/hostileNames.ts';
import { hostileDesignArb } from './arbitraries.ts';
import { carriedCells, designOfSpice, findableCells } from './designCarried.ts';

function reimport(text: string): Design {
  const back = designOfSpice(text);
  if ('failure' in back) throw new Error(back.failure);
  return back;
}

describe('SPICE export of a hostile design', () => {
  it('reads back as the same cells, instances, expected functions and model cards', () => {
    fc.assert(
      fc.property(hostileDesignArb, (design) => {
        const back = reimport(exportSpiceDesign(design));
        const found = findableCells(design);
        expect(carriedCells(back.cells)).toEqual(carriedCells(found));
        // The export writes the cards the devices name.
        const named = new Set(
          found.flatMap((c) => c.netlist.devices.map((d) => ('model' in d ? d.model : undefined))),
        );
        const used = Object.entries(design.technology.models ?? {}).filter(([name]) => named.has(name));
        expect({ ...back.technology.models }).toEqual(Object.fromEntries(used));
        for (const type of ['nmos', 'pmos'] as const)
          for (const field of MODEL_FIELDS)
            expect(technologyValue(back.technology, type, field)).toBe(
              technologyValue(design.technology, type, field),
            );
      }),
      { seed: 1651, numRuns: 200 },
    );
  });

  it('holds no statement but its own', () => {
    fc.assert(
      fc.property(hostileDesignArb, (design) => {
        const lines = exportSpiceDesign(design).split('\n');
        expect(lines.some((l) => hasControlCharacter(l))).toBe(false);
        const statements = lines.filter((l) => l !== '' && !l.startsWith('*'));
        const kinds = statements.map(
          (l) => /^\.(model|global|subckt|ends|end)\b/.exec(l)?.[1] ?? l.charAt(0).toUpperCase(),
        );
        expect(kinds.filter((k) => k === 'subckt')).toHaveLength(design.cells.length);
        expect(kinds.filter((k) => k === 'ends')).toHaveLength(design.cells.length);
        expect(kinds.at(-1)).toBe('end');
        const placements = design.cells.reduce((n, c) => n + c.instances.length, 0);
        expect(kinds.filter((k) => k === 'X')).toHaveLength(placements);
        expect(kinds.every((k) => /^(model|global|subckt|ends|end|[MRCDVX])$/.test(k))).toBe(true);
      }),
      { seed: 1652, numRuns: 200 },
    );
  });

  it('leaves an unwired pin unwired and a renamed instance named as drawn', () => {
    const inv: Cell = {
      name: 'inv',
      netlist: {
        name: 'inv',
        devices: [
          { kind: 'pmos', name: 'P', gate: 'A', drain: 'Y', source: 'VDD', w: 2, l: 0.25 },
          { kind: 'nmos', name: 'N', gate: 'A', drain: 'Y', source: 'GND', w: 1, l: 0.25 },
        ],
        rails: [
          { net: 'VDD', role: 'supply' },
          { net: 'GND', role: 'ground' },
        ],
        inputs: ['A'],
        outputs: ['Y'],
      },
      instances: [],
      expectations: {},
      sequences: [],
    };
    const top: Cell = {
      name: 'top',
      netlist: { name: 'top', devices: [], rails: [], inputs: ['in'], outputs: ['out'] },
      instances: [{ name: 'U 1', cell: 'inv', pins: { A: 'in', Y: 'out' } }],
      expectations: { out: '!in' },
      sequences: [],
    };
    const design: Design = { name: 'd', technology: DEFAULT_TECHNOLOGY, cells: [inv, top], open: 'top' };
    const text = exportSpiceDesign(design);
    expect(text).toContain('* railwise: name instance XU_1 "U 1"');
    expect(text).toContain('* railwise: unwired XU_1 VDD GND');
    expect(text).toContain('XU_1 in out VDD GND inv');
    expect(reimport(text).cells.find((c) => c.name === 'top')?.instances).toEqual(top.instances);
  });
});

/** Verilog tokens outside comments: escaped identifiers (with their backslash), words, punctuation. */
function verilogTokens(text: string): string[] {
  const out: string[] = [];
  const lexer = /\s+|\/\/[^\n]*|\\(\S+)\s|([A-Za-z_][A-Za-z0-9_$]*)|([(),;.])|([\s\S])/gy;
  for (let m = lexer.exec(text); m !== null; m = lexer.exec(text)) {
    if (m[4] !== undefined) throw new Error(`unexpected character ${JSON.stringify(m[4])} at ${m.index}`);
    const token = m[1] ?? m[2] ?? m[3];
    if (token !== undefined) out.push(m[1] === undefined ? token : `\\${token}`);
  }
  return out;
}

describe('Verilog of a hostile design', () => {
  it('is one module per cell, each instance of a module defined before it, ports by its own names', () => {
    fc.assert(
      fc.property(hostileDesignArb, (design) => {
        const text = exportVerilogDesign(design);
        expect(hasControlCharacter(text, '\n')).toBe(false);
        const statements = verilogTokens(text).join(' ').split(' ; ');
        const ports = new Map<string, Set<string>>();
        let instances = 0;
        for (const s of statements) {
          const words = s.replace(/^endmodule /, '').split(' ');
          if (words[0] === 'module') {
            const list = words.slice(3, -1).filter((w) => w !== ',');
            ports.set(words[1] as string, new Set(list));
          } else if (ports.has(words[0] as string)) {
            instances++;
            const connected = words.flatMap((w, i) => (words[i - 1] === '.' ? [w] : []));
            for (const port of connected) expect(ports.get(words[0] as string)?.has(port)).toBe(true);
          }
        }
        expect(ports.size).toBe(design.cells.length);
        expect(instances).toBe(design.cells.reduce((n, c) => n + c.instances.length, 0));
      }),
      { seed: 1653, numRuns: 200 },
    );
  });
});

describe('hand-edited name directives', () => {
  it('never give two nets, or two cells, one name', () => {
    const text = [
      '.subckt a IN OUT VDD GND',
      '* railwise: name net IN_2 "OUT"',
      'MN OUT IN GND GND nch W=1u L=0.25u',
      'MP OUT IN VDD VDD pch W=2u L=0.25u',
      '.ends',
      '.subckt b IN OUT VDD GND',
      '* railwise: name cell b "a"',
      'X1 IN OUT VDD GND a',
      '.ends',
    ].join('\n');
    const imported = importSpice(text, 'edited.sp');
    const design = designFromImport(imported, DEFAULT_TECHNOLOGY, 'edited');
    expect(design.cells.map((c) => c.name).sort()).toEqual(['a', 'b']);
    const a = design.cells.find((c) => c.name === 'a');
    expect(a?.netlist.inputs).toEqual(['IN']);
    expect(imported.notes.join('\n')).toMatch(/b: its name directive would give two cells the name "a"/);
  });
});
