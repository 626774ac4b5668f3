/**
 * No name or text of a design can add a statement to an export or break its syntax. Verilog is
 * read with the lexical rules of IEEE Std 1364-2005 clause 3 (comments 3.3, identifiers and
 * escaped identifiers 3.7 and 3.7.1); CSV with RFC 4180 section 2; SVG with the Char production
 * of XML 1.0 (fifth edition, 2.2) and its five predefined entities (4.6). The spreadsheet-formula
 * rule is OWASP's CSV-injection guidance, from memory.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { checkSweep } from '../../src/core/analysis/check.ts';
import { exportTruthTableCsv } from '../../src/core/netlist-io/csvExport.ts';
import { exportVerilog } from '../../src/core/netlist-io/verilogExport.ts';
import { sheetToSvg } from '../../src/core/sheet/svg.ts';
import type { SheetPart } from '../../src/core/sheet/types.ts';
import { makeSheetPart, PART_KINDS, type PartKind } from '../../src/core/sheet/parts/index.ts';
import { hasControlCharacter, HOSTILE_NAMES } from '../fixtures/hostileNames.ts';
import { hostileNetlistArb } from './arbitraries.ts';
import { reportRows } from '../../src/core/analysis/sweepColumns.ts';

/** Verilog tokens outside comments: escaped identifiers (without the backslash), words, punctuation. */
function verilogTokens(text: string): string[] {
  const out: string[] = [];
  const lexer = /\s+|\/\/[^\n]*|\\(\S+)\s|([A-Za-z_][A-Za-z0-9_$]*)|([(),;])|([\s\S])/gy;
  for (let m = lexer.exec(text); m !== null; m = lexer.exec(text)) {
    if (m[4] !== undefined) throw new Error(`unexpected character ${JSON.stringify(m[4])} at ${m.index}`);
    const token = m[1] ?? m[2] ?? m[3];
    if (token !== undefined) out.push(m[1] === undefined ? token : `\\${token}`);
  }
  return out;
}

const KEYWORDS_USED = ['module', 'endmodule', 'input', 'output', 'wire', 'supply0', 'supply1'];
const PRIMITIVES = ['nmos', 'pmos', 'tranif0', 'tranif1', 'rtran'];

describe('Verilog export of hostile designs', () => {
  it('holds one module of declarations and primitive instances, every identifier unique', () => {
    fc.assert(
      fc.property(hostileNetlistArb, (netlist) => {
        const text = exportVerilog(netlist);
        expect(hasControlCharacter(text, '\n')).toBe(false);
        const tokens = verilogTokens(text);
        expect(tokens[0]).toBe('module');
        expect(tokens.at(-1)).toBe('endmodule');
        const statements = tokens.slice(0, -1).join(' ').split(' ; ');
        const words = statements.map((s) => s.split(' ')[0]);
        expect(words.filter((w) => w === 'module')).toHaveLength(1);
        expect(
          words
            .slice(1)
            .every((w) => KEYWORDS_USED.includes(w as string) || PRIMITIVES.includes(w as string)),
        ).toBe(true);
        const instances = statements.filter((s) => PRIMITIVES.includes(s.split(' ')[0] as string));
        const instanceNames = instances.map((s) => (s.split(' ')[1] as string).replace(/^\\/, ''));
        const declared = new Set(
          statements
            .filter((s) => /^(input|output|wire|supply0|supply1) /.test(s))
            .flatMap((s) =>
              s
                .split(' ')
                .slice(1)
                .filter((t) => t !== ','),
            )
            .map((t) => t.replace(/^\\/, '')),
        );
        expect(new Set(instanceNames).size).toBe(instanceNames.length);
        expect(instanceNames.some((n) => declared.has(n))).toBe(false);
        expect(instances).toHaveLength(
          netlist.devices.filter((d) => d.kind !== 'capacitor' && d.kind !== 'diode').length,
        );
      }),
      { seed: 1618, numRuns: 300 },
    );
  });

  it('escapes what is no simple identifier and numbers what the reader would merge', () => {
    const text = exportVerilog({
      name: 'module',
      devices: [{ kind: 'resistor', name: 'mid_node', a: 'mid node', b: 'mid_node', ohms: 1e3 }],
      rails: [],
      inputs: ['\\mid_node '],
      outputs: ['mid node'],
    });
    expect(text).toContain('// name module \\module  = "module"');
    // The input `\mid_node ` keeps its backslash; its space becomes `_` (no space inside an identifier).
    expect(text).toContain('// name net \\\\mid_node_  = "\\\\mid_node "');
    expect(text).toContain('// name net \\mid_node_2  = "mid node"');
    expect(text).toContain('// name instance mid_node_3 = "mid_node"');
    expect(text).toContain('rtran mid_node_3 (\\mid_node_2 , mid_node);');
  });
});

/** RFC 4180 records: fields, quoted or not, separated by commas, records by CRLF. */
function csvRecords(text: string): string[][] {
  const records: string[][] = [[]];
  const field = /"((?:[^"]|"")*)"|([^",\r\n]*)/y;
  let i = 0;
  while (i < text.length) {
    field.lastIndex = i;
    const m = field.exec(text) as RegExpExecArray;
    records.at(-1)?.push(m[1] === undefined ? (m[2] as string) : m[1].replace(/""/g, '"'));
    i = field.lastIndex;
    if (text.startsWith(',', i)) i += 1;
    else if (text.startsWith('\r\n', i)) {
      i += 2;
      if (i < text.length) records.push([]);
    } else if (i < text.length) throw new Error(`bad CSV at ${i}`);
  }
  return records;
}

describe('CSV of hostile designs', () => {
  it('one record per row, equal lengths, no line breaks or controls, no cell a spreadsheet runs', () => {
    fc.assert(
      fc.property(hostileNetlistArb, (netlist) => {
        const report = checkSweep(netlist);
        const records = csvRecords(exportTruthTableCsv(report));
        expect(records).toHaveLength((reportRows(report).length ?? 0) + 1);
        const width = records[0]?.length;
        for (const r of records) {
          expect(r).toHaveLength(width as number);
          for (const cell of r) {
            expect(hasControlCharacter(cell)).toBe(false);
            expect(/^[=+\-@]/.test(cell) && Number.isNaN(Number(cell))).toBe(false);
          }
        }
        expect(new Set(records[0]).size).toBe(width);
      }),
      { seed: 1619, numRuns: 60 },
    );
  });
});

/** XML 1.0 Char (2.2) minus what we never write, and balanced tags with quoted, entity-safe attributes. */
function assertWellFormedSvg(text: string): void {
  expect(/[^\t\n\r\u0020-\ud7ff\ue000-\ufffd\u{10000}-\u{10ffff}]/u.test(text)).toBe(false);
  const body = text.replace(/^<\?xml[^>]*\?>\n/, '');
  const tag = /<(\/?)([a-z]+)((?:\s+[A-Za-z:-]+="[^"<&]*(?:&(?:lt|gt|amp|quot|apos);[^"<&]*)*")*)\s*(\/?)>/gy;
  const text_ = /[^<&]*(?:&(?:lt|gt|amp|quot|apos);[^<&]*)*/y;
  const open: string[] = [];
  let i = 0;
  while (i < body.length) {
    text_.lastIndex = i;
    i += (text_.exec(body) as RegExpExecArray)[0].length;
    if (i >= body.length) break;
    tag.lastIndex = i;
    const m = tag.exec(body);
    if (m === null) throw new Error(`not well-formed at ${i}: ${JSON.stringify(body.slice(i, i + 40))}`);
    if (m[1] === '/') expect(open.pop()).toBe(m[2]);
    else if (m[4] !== '/') open.push(m[2] as string);
    i = tag.lastIndex;
  }
  expect(open).toEqual([]);
}

describe('SVG of a sheet with hostile names', () => {
  it('(the checker itself refuses what is not well-formed)', () => {
    for (const bad of ['<g>&</g>', '<g></text>', '<g a=b></g>', '<g>\u0007</g>', '<g>']) {
      expect(() => assertWellFormedSvg(bad)).toThrow();
    }
    expect(() => assertWellFormedSvg('<g a="1">x &amp; y<h/></g>')).not.toThrow();
  });

  it('is well-formed XML with no forbidden character, every name shown escaped', () => {
    const parts: SheetPart[] = HOSTILE_NAMES.map((name, i) =>
      makeSheetPart(PART_KINDS[i % PART_KINDS.length] as PartKind, {
        id: name,
        name,
        x: (i % 6) * 8,
        y: Math.floor(i / 6) * 8,
        rotation: 0,
        mirror: false,
      }),
    );
    const svg = sheetToSvg({
      parts,
      wires: [
        {
          id: '<w>',
          points: [
            { x: 0, y: 0 },
            { x: 5, y: 0 },
          ],
        },
      ],
    });
    assertWellFormedSvg(svg);
    expect(svg).toContain('\\u001b[2J');
    expect(svg).toContain('&lt;svg onload=&quot;x&quot;&gt;');
  });
});
