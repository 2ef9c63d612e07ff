/**
 * Frame timing while a share slider is dragged: every animation frame and every slider input event are
 * recorded in the page; frames that carried work (an input arrived since the previous frame) give the
 * frame-time distribution. 30 frames per second or better = median frame ≤ 33 ms (common practice).
 */
import type { Page } from '@playwright/test';

interface Probe {
  frames: number[];
  inputs: number[];
  computeMs: number[];
  stop: boolean;
}

export interface DragTiming {
  inputs: number;
  workedFrames: number;
  dragMs: number;
  medianMs: number;
  p95Ms: number;
  maxMs: number;
  /** Evaluation times the readout showed (ms), sorted. */
  computeMs: number[];
}

/** Drags the slider with element id `sliderId` back and forth twice (41 moves a pass) and times the frames. */
export async function dragAndTime(page: Page, sliderId: string, label: string): Promise<DragTiming> {
  const slider = page.getByLabel(label, { exact: true });
  await slider.scrollIntoViewIfNeeded();
  const box = (await slider.boundingBox())!;
  const value = Number(await slider.inputValue());
  await page.evaluate((id) => {
    const w = window as unknown as { __probe: Probe };
    w.__probe = { frames: [], inputs: [], computeMs: [], stop: false };
    document.getElementById(id)!.addEventListener('input', () => w.__probe.inputs.push(performance.now()));
    const out = document.querySelector('[data-testid="compute-ms"]');
    if (out)
      new MutationObserver(() => w.__probe.computeMs.push(parseFloat(out.textContent!.replace(/[^\d.]/g, '')))).observe(out, {
        childList: true,
        characterData: true,
        subtree: true
      });
    const loop = (t: number) => {
      w.__probe.frames.push(t);
      if (!w.__probe.stop) requestAnimationFrame(loop);
    };
    requestAnimationFrame(loop);
  }, sliderId);
  const y = box.y + box.height / 2;
  await page.mouse.move(box.x + (value / 100) * box.width, y);
  await page.mouse.down();
  const started = Date.now();
  for (let pass = 0; pass < 2; pass++) {
    for (let i = 0; i <= 40; i++) await page.mouse.move(box.x + box.width * (0.2 + (pass % 2 === 0 ? i : 40 - i) * 0.015), y);
  }
  await page.mouse.up();
  const dragMs = Date.now() - started;
  const probe = await page.evaluate(() => {
    const w = window as unknown as { __probe: Probe };
    w.__probe.stop = true;
    return w.__probe;
  });
  const first = probe.inputs[0];
  const last = probe.inputs[probe.inputs.length - 1];
  const worked: number[] = [];
  for (let i = 1; i < probe.frames.length; i++) {
    const [a, b] = [probe.frames[i - 1], probe.frames[i]];
    if (b < first || a > last + 50) continue;
    if (probe.inputs.some((t) => t > a && t <= b)) worked.push(b - a);
  }
  const sorted = [...worked].sort((p, q) => p - q);
  const pick = (q: number) => sorted[Math.min(sorted.length - 1, Math.floor(q * sorted.length))];
  return {
    inputs: probe.inputs.length,
    workedFrames: worked.length,
    dragMs,
    medianMs: pick(0.5),
    p95Ms: pick(0.95),
    maxMs: sorted[sorted.length - 1],
    computeMs: [...probe.computeMs].sort((p, q) => p - q)
  };
}
