/**
 * The zod schema of the design file, version 2: a design of several cells (docs/semantics.md §1,
 * hierarchy). The records inside a cell (netlist, sequences, sheet, technology) are version 1's,
 * from schema.ts; a cell adds the instances it places.
 */
import { z } from 'zod';
import { DEFAULT_TECHNOLOGY } from '../model/technology.ts';
import { nameRecord } from '../model/records.ts';
import {
  DESIGN_FORMAT_TAG,
  namedRecord,
  netlistSchema,
  sequenceSchema,
  sheetSchema,
  technologySchema,
} from './schema.ts';
import { modelProblems, netlistProblem } from './designChecks.ts';

const name = z.string().min(1, 'a name cannot be empty');

export const instanceSchema = z.object({
  name,
  cell: name,
  // Keyed by the placed cell's pin names, which may be any name (`__proto__` too).
  pins: namedRecord(z.string().min(1, 'a net name cannot be empty')),
});

export const cellSchema = z.object({
  name,
  netlist: netlistSchema,
  instances: z.array(instanceSchema).default([]),
  expectations: namedRecord(z.string()).default(nameRecord<string>()),
  sequences: z.array(sequenceSchema).default([]),
  sheet: sheetSchema.optional(),
  globals: z.array(z.string().min(1)).optional(),
});

export const designFileV2Schema = z
  .object({
    format: z.literal(DESIGN_FORMAT_TAG),
    version: z.literal(2),
    name: z.string(),
    technology: technologySchema.default(DEFAULT_TECHNOLOGY),
    open: z.string(),
    cells: z.array(cellSchema).min(1, 'a design holds at least one cell'),
    notes: z.string().optional(),
  })
  .superRefine((d, ctx) => {
    const seen = new Map<string, number>();
    d.cells.forEach((c, i) => {
      const first = seen.get(c.name);
      if (first !== undefined)
        ctx.addIssue({
          code: 'custom',
          path: ['cells', i, 'name'],
          message: `cell ${c.name} is already defined as cells[${first}]`,
        });
      seen.set(c.name, i);
    });
    d.cells.forEach((c, i) => {
      const problems = [netlistProblem(c.netlist), ...modelProblems(d.technology, c.netlist, c.sheet?.parts)];
      for (const p of problems)
        if (p !== null) ctx.addIssue({ code: 'custom', path: ['cells', i, ...p.path], message: p.message });
    });
    if (!seen.has(d.open))
      ctx.addIssue({ code: 'custom', path: ['open'], message: `no cell is named ${d.open}` });
    d.cells.forEach((c, i) =>
      c.instances.forEach((x, j) => {
        if (!seen.has(x.cell))
          ctx.addIssue({
            code: 'custom',
            path: ['cells', i, 'instances', j, 'cell'],
            message: `${x.name} places ${x.cell}, which no cell of the design is named`,
          });
      }),
    );
  });

export type DesignFileV2 = z.infer<typeof designFileV2Schema>;
