/** Runs axe-core in the page (evaluated through the driver, so the page's CSP stays as it is). */
import { readFileSync } from 'node:fs';
import type { Page } from 'playwright-core';

const AXE_SOURCE = readFileSync('node_modules/axe-core/axe.min.js', 'utf8');

export interface AxeSummary {
  violations: { id: string; impact: string | null; nodes: number; help: string }[];
}

export async function runAxe(page: Page): Promise<AxeSummary> {
  await page.evaluate(AXE_SOURCE);
  return page.evaluate(async () => {
    const axe = (
      window as unknown as {
        axe: {
          run: (
            ctx: Document,
            opts: object,
          ) => Promise<{ violations: { id: string; impact: string | null; nodes: unknown[]; help: string }[] }>;
        };
      }
    ).axe;
    const result = await axe.run(document, { resultTypes: ['violations'] });
    return {
      violations: result.violations.map((v) => ({ id: v.id, impact: v.impact, nodes: v.nodes.length, help: v.help })),
    };
  });
}
