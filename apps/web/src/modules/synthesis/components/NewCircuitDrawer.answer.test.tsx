// The new-circuit drawer's answer: an accepted proposal in words and units, a refusal's reason, an HTTP error's message.
import { screen, waitFor, within } from '@testing-library/react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { mockApi } from '../../../test/mockApi.js';
import { acceptedProposal, refusedProposal, SYNTHESISE_ROUTE } from '../test/demoSynthesis.js';
import { renderNewCircuitDrawer } from '../test/renderNewCircuitDrawer.js';

afterEach(() => vi.unstubAllGlobals());

describe('NewCircuitDrawer answer', { timeout: 20_000 }, () => {
  it('shows an accepted proposal: verdict, lengths, FSR, checks and figures in words, notes, other circuits', async () => {
    mockApi({ [SYNTHESISE_ROUTE]: { body: acceptedProposal } });
    const { user } = renderNewCircuitDrawer();
    await user.click(screen.getByTestId('synthesise'));
    const proposal = await screen.findByTestId('proposal');
    const text = proposal.textContent ?? '';

    expect(within(proposal).getByTestId('verdict').textContent).toBe('Fail');
    expect(text).toContain('1 of 3 checks failed.');
    // 6 gates of 650 um each: 3.9 mm (one unit = one gate plus its bend, docs/formats.md).
    expect(text).toContain('6 units (3.9 mm)');
    // Ring FSR = c / (n_g * L) = 299792458 / (4.2 * 6 * 650e-6 m) = 18.30 GHz (common practice; c from the SI brochure).
    const lengths = within(proposal).getByTestId('realised-lengths');
    expect(within(lengths).getByText('Ring FSR').nextElementSibling?.textContent).toBe('18.3 GHz');

    const output = within(proposal).getByTestId('output-E03');
    expect(output.textContent).toContain('W03 to E03');
    expect(within(output).getByText('Notch depth below the off-resonance level').nextElementSibling?.textContent).toBe('17.5 dB');
    expect(within(output).getByText('Notch width at half depth').nextElementSibling?.textContent).toBe('1.291 GHz');
    expect(within(output).getByText('Off-resonance insertion loss').nextElementSibling?.textContent).toBe('1.75 dB');
    const depthRow = within(output).getByText(/^Notch depth$/).closest('tr');
    expect(depthRow?.textContent).toContain('at least 19 dB');
    expect(depthRow?.textContent).toContain('−1.5 dB');
    expect(depthRow?.textContent).toContain('3.01 GHz');
    expect(depthRow?.textContent).toContain('Missed');

    const notes = within(proposal).getByTestId('realisation-notes');
    expect(notes.textContent).toContain('Ring FSR: requested 20 GHz, achieved 18.3 GHz — nearest realisable ring is 6 units');
    expect(within(proposal).getByTestId('other-circuits').textContent).toContain('delay-a Still passes');

    expect(text).not.toMatch(/notchWidthHz|notchDepthDb|insertionLossDb|e\+\d|e-\d/);
  });

  it('hands the accepted proposal and the spec it came from to onAccept', async () => {
    mockApi({ [SYNTHESISE_ROUTE]: { body: acceptedProposal } });
    const { user, onAccept } = renderNewCircuitDrawer();
    await user.click(screen.getByTestId('synthesise'));
    await user.click(await screen.findByRole('button', { name: 'Add to workspace' }));
    expect(onAccept).toHaveBeenCalledTimes(1);
    const [proposal, spec] = onAccept.mock.calls[0] ?? [];
    expect(proposal).toEqual(acceptedProposal);
    expect(spec?.spec.kind).toBe('ring-notch');
    expect(spec?.schemaVersion).toBe(1);
  });

  it('shows progress while the server works', async () => {
    let release: () => void = () => undefined;
    const answered = new Promise<void>((resolve) => (release = resolve));
    mockApi({ [SYNTHESISE_ROUTE]: { body: refusedProposal } });
    const fetchMock = vi.mocked(globalThis.fetch);
    const answer = fetchMock.getMockImplementation();
    fetchMock.mockImplementation(async (...args) => {
      await answered;
      return answer ? answer(...args) : new Response(null, { status: 500 });
    });
    const { user } = renderNewCircuitDrawer();
    await user.click(screen.getByTestId('synthesise'));
    expect(await screen.findByTestId('synthesis-progress')).toBeTruthy();
    release();
    await waitFor(() => expect(screen.queryByTestId('synthesis-progress')).toBeNull());
    expect(screen.getByTestId('proposal-refusal')).toBeTruthy();
  });

  it('shows a refusal with its reason in words and the server message', async () => {
    mockApi({ [SYNTHESISE_ROUTE]: { body: refusedProposal } });
    const { user, onAccept } = renderNewCircuitDrawer();
    await user.click(screen.getByTestId('synthesise'));
    const refusal = await screen.findByTestId('proposal-refusal');
    expect(refusal.textContent).toContain('There is not enough free area on the chip');
    expect(refusal.textContent).toContain(refusedProposal.message);
    expect(refusal.textContent).not.toContain('not-enough-free-area');
    expect(screen.queryByRole('button', { name: 'Add to workspace' })).toBeNull();
    expect(onAccept).not.toHaveBeenCalled();
  });

  it('shows the message of an HTTP error answer', async () => {
    mockApi({ [SYNTHESISE_ROUTE]: { status: 403, body: { statusCode: 403, error: 'Forbidden', message: 'Only designers and owners may synthesise circuits' } } });
    const { user } = renderNewCircuitDrawer();
    await user.click(screen.getByTestId('synthesise'));
    const callout = await screen.findByTestId('api-error');
    expect(callout.textContent).toContain('Could not synthesise');
    expect(callout.textContent).toContain('Only designers and owners may synthesise circuits');
  });
});
