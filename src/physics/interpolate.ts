/** Piecewise-linear interpolation in a table sorted by x; undefined outside its range. */
export function interpolateTable(table: readonly (readonly [number, number])[], x: number): number | undefined {
  const first = table[0];
  const last = table[table.length - 1];
  if (!first || !last || !(x >= first[0] && x <= last[0])) return undefined;
  for (let i = 1; i < table.length; i++) {
    const [x1, y1] = table[i]!;
    if (x <= x1) {
      const [x0, y0] = table[i - 1]!;
      return y0 + ((y1 - y0) * (x - x0)) / (x1 - x0);
    }
  }
  return last[1];
}
