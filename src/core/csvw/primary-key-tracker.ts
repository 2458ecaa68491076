// Primary key uniqueness ("Model for Tabular Data" §4.5 Primary keys: "validators MUST raise errors
// if there is more than one row with the same primary key"), checked one record at a time.

export interface PrimaryKeyTracker {
  /**
   * Records a row's key cells (as written); returns the first row that had the same key, or null.
   * Rows are the caller's numbers (1-based data rows in Assay).
   */
  add(row: number, record: readonly string[]): number | null;
}

/**
 * Remembers each key seen (memory grows with the distinct keys). Cells are joined with a separator
 * that cannot occur in text (U+0000 and the cell lengths), so ("a,b", "c") and ("a", "b,c") differ.
 * Example: primaryKeyTracker([0]).add(1, ['x']) gives null; a second add(2, ['x']) gives 1.
 */
export function primaryKeyTracker(fields: readonly number[]): PrimaryKeyTracker {
  const seen = new Map<string, number>();
  return {
    add(row, record) {
      if (fields.length === 0) return null;
      const key = fields.map((f) => {
        const cell = record[f] ?? '';
        return `${cell.length}\u0000${cell}`;
      }).join('\u0000');
      const first = seen.get(key);
      if (first !== undefined) return first;
      seen.set(key, row);
      return null;
    },
  };
}
