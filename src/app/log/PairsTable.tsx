/**
 * Lab against prediction, job by job: a table that fits a 390 px phone in every language. Each job
 * is a row group: its part (a link) and a second line across the width, then its figures under
 * the column headings, so no column is pushed out of sight.
 */
import type { ComponentChildren } from 'preact';
import { hrefFor } from '../shell/route';

export interface PairRow {
  id: string;
  title: string;
  subtitle?: string | undefined;
  /** The figures, one per column, in the order of `columns`. */
  cells: readonly ComponentChildren[];
}

export function PairsTable({
  caption,
  columns,
  rows,
}: {
  caption: string;
  columns: readonly string[];
  rows: readonly PairRow[];
}) {
  return (
    <table class="numbers pairs">
      <caption>{caption}</caption>
      <thead>
        <tr>
          {columns.map((column) => (
            <th key={column} scope="col">
              {column}
            </th>
          ))}
        </tr>
      </thead>
      {rows.map((row) => (
        <tbody key={row.id}>
          <tr class="pair-head">
            <th scope="rowgroup" colSpan={columns.length}>
              <a href={hrefFor('log', 'job', row.id)} data-literal>
                {row.title}
              </a>
              {row.subtitle && (
                <span class="pair-furnace" data-literal>
                  {row.subtitle}
                </span>
              )}
            </th>
          </tr>
          <tr>
            {row.cells.map((cell, i) => (
              <td key={i}>{cell}</td>
            ))}
          </tr>
        </tbody>
      ))}
    </table>
  );
}
