import type { DataSource } from 'typeorm';
import { InputError } from '../http/input-error';

/** A run id's hex digits as the canonical 8-4-4-4-12 form. */
const canonical = (hex: string) =>
  `${hex.slice(0, 8)}-${hex.slice(8, 12)}-${hex.slice(12, 16)}-${hex.slice(16, 20)}-${hex.slice(20)}`;

/**
 * The one run a start of a run id names (shared/schemas/run-id-prefix.ts has checked its shape),
 * or a 400 on `field` saying it names none or several. Every id that starts with the digits lies
 * between the digits padded with 0s and with fs, so the primary key's index answers it (a text
 * LIKE on the id would read every run).
 */
export async function resolveRunPrefix(dataSource: DataSource, prefix: string, field: string): Promise<string> {
  const hex = prefix.replaceAll('-', '');
  const rows: { id: string }[] = await dataSource.query(
    `SELECT id FROM runs WHERE id BETWEEN $1::uuid AND $2::uuid ORDER BY id LIMIT 2`,
    [canonical(hex.padEnd(32, '0')), canonical(hex.padEnd(32, 'f'))],
  );
  if (rows.length === 0) throw new InputError([{ field, rule: `names no run ("${prefix}")` }]);
  if (rows.length > 1)
    throw new InputError([
      { field, rule: `is the start of more than one run's id ("${prefix}"); type more of the id to tell them apart` },
    ]);
  return rows[0]!.id;
}
