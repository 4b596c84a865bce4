import { z } from 'zod';
import { textSchema } from './text-schema';

const boxText = /^\s*[^,]+,[^,]+,[^,]+,[^,]+\s*$/;

/**
 * The input of `sheetkeeper cutmap` (flags as strings): the target, one function (as the
 * fingerprint names them: "sqrt", "pow(z, 1/2)", "asin"), the box "re0,im0,re1,im1" (lower
 * left, upper right), the grid "COLUMNSxROWS" and the output. The default box −4..4 with an
 * 81×81 grid puts grid lines on both axes (cells of 0.1).
 */
export const cutMapRequest = z.strictObject({
  target: textSchema('is required (NAME@VERSION as `sheetkeeper targets` lists it)').min(1),
  fn: textSchema('is required (one function, e.g. sqrt)').min(1),
  box: textSchema()
    .regex(boxText, { error: 'must be four numbers re0,im0,re1,im1' })
    .transform((s) => s.split(',').map((x) => Number(x.trim())))
    .refine((b) => b.every(Number.isFinite), { error: 'must be four finite numbers' })
    .refine((b) => b[0]! < b[2]! && b[1]! < b[3]!, { error: 'needs re0 < re1 and im0 < im1' })
    .default([-4, -4, 4, 4]),
  grid: textSchema()
    .regex(/^\d+x\d+$/, { error: 'must be COLUMNSxROWS, e.g. 81x81' })
    .transform((s) => s.split('x').map(Number))
    .refine((g) => g.every((k) => k >= 3 && k <= 1001), { error: 'needs 3 to 1001 columns and rows' })
    .default([81, 81]),
  format: z.enum(['json', 'svg', 'table'], { error: 'must be json, svg or table' }).default('json'),
  out: textSchema().min(1).optional(),
});

export type CutMapRequest = z.infer<typeof cutMapRequest>;
