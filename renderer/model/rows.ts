/** Rows whose every field is blank are not sent, so a spare empty row is never an error. */
const blank = (row: object): boolean => Object.values(row).every((v) => typeof v !== 'string' || v.trim() === '');

/**
 * The rows worth sending, built by `build`; `rows` records which form row each sent item came from,
 * because the schema's paths count only the sent ones.
 */
export function sentRows<T extends object>(list: readonly T[], rows: number[], build: (row: T, i: number) => Record<string, unknown>) {
  return list.map((row, i) => ({ row, i })).filter(({ row }) => !blank(row)).map(({ row, i }) => {
    rows.push(i);
    return build(row, i);
  });
}

/** "loads[1].force" of the sent spec as the path of its row in the form. */
export function rowPath(path: string, key: string, rows: readonly number[]): string {
  const pattern = new RegExp(`^${key}\\[(\\d+)\\]`);
  return path.replace(pattern, (_, k: string) => `${key}[${rows[Number(k)] ?? k}]`);
}

/** The raw fields of one kind plus the mapping of its error paths back to the form. */
export interface KindRaw {
  raw: Record<string, unknown>;
  formPath(path: string): string;
}
