import Papa from 'papaparse';
import { describe, expect, it } from 'vitest';
import { CSV_COLUMNS, csvRow, guardText, jobsToCsv } from '../../src/jobs/csv';
import { demoJobs } from '../../src/app/log/demo/demoLog';
import type { Job } from '../../src/jobs/schema';
import { exportCsv } from '../../src/jobs/transfer';
import { freshStore, pinionDraft, unwrap } from './helpers';

const base = demoJobs({ count: 1, end: new Date('2025-05-01T12:00:00Z'), seed: 5 })[0]!;
const parse = (text: string) => Papa.parse<Record<string, string>>(text, { header: true, skipEmptyLines: true });

describe('CSV formula-injection guard (text cells only)', () => {
  it.each(['=1+2', '+SUM(A1)', '-2+3', '@cmd', '\tTAB', '\rCR', '=HYPERLINK("http://x")'])(
    'prefixes %j with a single quote',
    (text) => {
      expect(guardText(text)).toBe(`'${text}`);
    },
  );
  it.each(['KR-2231', 'WO-024117', 'plain note', '', "'already quoted", ' =space first'])(
    'leaves %j as it is',
    (text) => {
      expect(guardText(text)).toBe(text);
    },
  );

  it('guards text fields in a row but writes numbers unguarded, negatives included', () => {
    const job: Job = {
      ...base,
      operator: 'MK',
      workOrder: '=cmd|/C calc',
      partNumber: '+KR-2231',
      notes: '-10 °C dip at 2 h',
      prediction: { ...base.prediction!, effectiveCaseDepthMm: 0.8 },
      lab: { ecdMm: 0.85, by: '@lab' },
    };
    const row = Object.fromEntries(CSV_COLUMNS.map((c, i) => [c.header, csvRow(job)[i]]));
    expect(row.work_order).toBe("'=cmd|/C calc");
    expect(row.part_number).toBe("'+KR-2231");
    expect(row.notes).toBe("'-10 °C dip at 2 h");
    expect(row.measured_by).toBe("'@lab");
    // 0.8 − 0.85 is −0.04999999999999993 in floating point: written rounded to the column's unit.
    expect(row.ecd_difference_mm).toBe('-0.05');
    expect(row.ecd_difference_mm!.startsWith('-')).toBe(true);
    expect(row.ecd_difference_pct!.startsWith('-')).toBe(true);
  });
});

describe('CSV export', () => {
  it('no number cell of 200 demo jobs carries floating noise (at most 4 decimals, or 6 significant digits)', () => {
    const noisy = demoJobs({ count: 200, end: new Date('2025-05-01T12:00:00Z'), seed: 9 })
      .flatMap((job) => csvRow(job))
      .filter((cell) => /^-?\d+\.\d+$/u.test(cell))
      .filter((cell) => cell.split('.')[1]!.length > 4 && cell.replace(/[-.]/gu, '').replace(/^0+/u, '').length > 6);
    expect(noisy).toEqual([]);
  });

  it('header row with units in the names, one row per job, ISO 8601 dates', async () => {
    const jobs = demoJobs({ count: 25, end: new Date('2025-05-01T12:00:00Z'), seed: 9 });
    const text = await jobsToCsv(jobs);
    expect(text.startsWith('\uFEFFid,created_at,updated_at,shift_date,shift,')).toBe(true);
    for (const header of [
      'predicted_ecd_mm',
      'measured_ecd_mm',
      'temperature_c',
      'time_h',
      'core_carbon_pct',
      'ecd_difference_pct',
    ]) {
      expect(CSV_COLUMNS.map((c) => c.header)).toContain(header);
    }
    const parsed = parse(text);
    expect(parsed.errors).toEqual([]);
    expect(parsed.data).toHaveLength(25);
    for (const [i, row] of parsed.data.entries()) {
      expect(row.id).toBe(jobs[i]!.id);
      expect(row.created_at).toMatch(/^\d{4}-\d{2}-\d{2}T\d{2}:\d{2}:\d{2}\.\d{3}Z$/u);
      expect(row.shift_date).toMatch(/^\d{4}-\d{2}-\d{2}$/u);
      expect(Number(row.predicted_ecd_mm)).toBe(jobs[i]!.prediction!.effectiveCaseDepthMm);
    }
  });

  it('notes with commas, quotes, line breaks and accents come back intact from a CSV reader', async () => {
    const notes = 'Load 2, basket "B"\nsecond line; Ölstand ok — ñ';
    const text = await jobsToCsv([{ ...base, notes }]);
    expect(parse(text).data[0]!.notes).toBe(notes);
  });

  it('decimal comma with semicolons for es/de spreadsheets', async () => {
    const job: Job = { ...base, prediction: { ...base.prediction!, effectiveCaseDepthMm: 0.875 }, notes: 'a; b' };
    const text = await jobsToCsv([job], { decimalMark: ',' });
    const parsed = Papa.parse<Record<string, string>>(text, { header: true, delimiter: ';' });
    expect(parsed.data[0]!.predicted_ecd_mm).toBe('0,875');
    expect(parsed.data[0]!.notes).toBe('a; b');
    await expect(jobsToCsv([job], { decimalMark: ',', delimiter: ',' })).rejects.toThrow(RangeError);
  });

  it('exportCsv writes the whole store, oldest first', async () => {
    const store = await freshStore();
    const first = unwrap(
      await store.add(pinionDraft({ workOrder: 'WO-1' }), { now: new Date('2025-03-05T07:00:00.000Z') }),
    );
    const second = unwrap(
      await store.add(pinionDraft({ workOrder: 'WO-2' }), { now: new Date('2025-03-05T08:00:00.000Z') }),
    );
    const file = unwrap(await exportCsv(store));
    expect(file.jobCount).toBe(2);
    expect(file.skipped).toEqual([]);
    expect(parse(file.text).data.map((r) => r.id)).toEqual([first.id, second.id]);
    store.close();
  });
});
