/** Collects what a browser reports as broken: console messages of type error and uncaught page errors. */
import { expect, type BrowserContext, type Page } from '@playwright/test';

export interface ConsoleWatch {
  /** Every problem so far, each with the page address it happened on. */
  problems: string[];
  /** Fails the test, naming each problem, if any was seen; `when` says at which step. */
  expectClean(when: string): void;
}

function watchPage(page: Page, problems: string[]): void {
  page.on('console', (msg) => {
    if (msg.type() === 'error') problems.push(`console error on ${page.url()}: ${msg.text()} (${msg.location().url})`);
  });
  page.on('pageerror', (err) => problems.push(`page error on ${page.url()}: ${err.message}`));
}

/** Watches every page of the context, those open now and those opened later (new tabs, pop-ups). */
export function watchConsole(context: BrowserContext): ConsoleWatch {
  const problems: string[] = [];
  for (const page of context.pages()) watchPage(page, problems);
  context.on('page', (page) => watchPage(page, problems));
  return {
    problems,
    expectClean(when: string) {
      expect(problems, `no console error or page error ${when}`).toEqual([]);
    }
  };
}
