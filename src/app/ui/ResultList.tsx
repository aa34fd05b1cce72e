/** Results as a definition list: a label, a formatted value (with unit) and an optional detail line. */
export interface ResultRow {
  key: string;
  label: string;
  value: string;
  detail?: string | undefined;
  main?: boolean;
  /** A word rather than a figure (a grade, a calculation): may wrap onto more lines. */
  text?: boolean;
}

export function ResultList({ rows, label }: { rows: readonly ResultRow[]; label: string }) {
  return (
    <dl class="results" aria-label={label}>
      {rows.map((row) => (
        <div
          key={row.key}
          class={['result', row.main ? 'result-main' : '', row.text ? 'result-text' : ''].filter(Boolean).join(' ')}
          data-result={row.key}
        >
          <dt>{row.label}</dt>
          <dd>
            <span class="result-value">{row.value}</span>
            {row.detail && <span class="result-detail">{row.detail}</span>}
          </dd>
        </div>
      ))}
    </dl>
  );
}
