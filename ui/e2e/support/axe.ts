import { readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import type { Page } from 'playwright-core';

const require = createRequire(import.meta.url);
const axeSource = readFileSync(require.resolve('axe-core/axe.min.js'), 'utf8');

export interface AxeFinding {
  id: string;
  impact: string;
  help: string;
  targets: string[];
}

/**
 * Runs axe-core (WCAG 2.x A and AA rules) in the page and returns the serious and critical
 * violations, each with the elements it names, so a failing test says what to fix.
 */
export async function seriousViolations(page: Page): Promise<AxeFinding[]> {
  const loaded = await page.evaluate(() => 'axe' in window);
  // Evaluated over the debugging protocol: the app's Content-Security-Policy refuses inline scripts.
  if (!loaded) await page.evaluate(axeSource);
  // Mantine transitions fade content in; judge the settled page.
  await page.waitForTimeout(400);
  return page.evaluate(async () => {
    const axe = (window as unknown as { axe: any }).axe;
    const result = await axe.run(document, {
      runOnly: { type: 'tag', values: ['wcag2a', 'wcag2aa', 'wcag21a', 'wcag21aa'] },
      resultTypes: ['violations'],
    });
    return (
      result.violations as {
        id: string;
        impact: string;
        help: string;
        nodes: { target: string[]; html: string; failureSummary?: string }[];
      }[]
    )
      .filter((v) => v.impact === 'serious' || v.impact === 'critical')
      .map((v) => ({
        id: v.id,
        impact: v.impact,
        help: v.help,
        targets: v.nodes
          .slice(0, 8)
          .map((n) => `${n.html.slice(0, 160)} — ${n.failureSummary ?? ''}`),
      }));
  });
}

/** Text cut off with an ellipsis (or clipped) although it has room to wrap: names what is hidden. */
export async function clippedTexts(page: Page): Promise<string[]> {
  return page.evaluate(() => {
    const out: string[] = [];
    for (const el of Array.from(document.querySelectorAll<HTMLElement>('body *'))) {
      if (el.children.length > 0 || !el.textContent?.trim()) continue;
      const style = getComputedStyle(el);
      if (style.textOverflow !== 'ellipsis' && style.overflow !== 'hidden') continue;
      // Hidden, or visually hidden for screen readers only (1 px box).
      if (el.offsetParent === null || el.clientWidth <= 1) continue;
      if (el.scrollWidth > el.clientWidth + 1) out.push(el.textContent.trim().slice(0, 60));
    }
    return out;
  });
}
