// In an open configuration workspace: the "new circuit" drawer filled for a second-order coupled-ring band-pass
// (the form's default ports W11 -> E11, through W14), synthesised on the server, and its proposal added to the draft.
import type { Page } from 'playwright-core';

/** Stops after "Add to workspace" (the draft then has unsaved edits); `onProposal` runs while the answer is shown. */
export async function addBandPass(page: Page, circuitId: string, onProposal?: () => Promise<unknown>): Promise<void> {
  await page.getByTestId('new-circuit').click();
  const form = page.getByTestId('new-circuit-form');
  await form.waitFor();
  await page.getByTestId('kind-select').selectOption('coupled-ring-bandpass');
  await page.getByTestId('circuit-id').fill(circuitId);
  await form.getByLabel(/^Order/).fill('2');
  await page.getByTestId('synthesise').click();
  await page.getByTestId('proposal').waitFor({ timeout: 90_000 });
  await onProposal?.();
  await page.getByRole('button', { name: 'Add to workspace' }).click();
  await page.getByTestId('unsaved').waitFor();
}
