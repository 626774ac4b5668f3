/**
 * The zod schema of the design file, version 2: a design of several cells (docs/semantics.md §1,
 * hierarchy). The records inside a cell (netlist, sequences, sheet, technology) are version 1's,
 * from schema.ts; a cell adds the instances it places.
 */
import { z } from 'zod';
import { DEFAULT_TECHNOLOGY } from '../model/technology.ts';
import { DESIGN_FORMAT_TAG, netlistSchema, sequenceSchema, sheetSchema, technologySchema } from './schema.ts';

const name = z.string().min(1, 'a name cannot be empty');

export const instanceSchema = z.object({
  name,
  cell: name,
  pins: z.record(z.string(), z.string().min(1, 'a net name cannot be empty')),
});

export const cellSchema = z.object({
  name,
  netlist: netlistSchema,
  instances: z.array(instanceSchema).default([]),
  expectations: z.record(z.string(), z.string()).default({}),
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
