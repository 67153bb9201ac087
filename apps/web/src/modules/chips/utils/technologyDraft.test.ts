// The technology draft: shown units in and out, every wrong field named at once, spreads given in pairs.
import { DEMO_TECHNOLOGY } from '@hexloom/mesh';
import { describe, expect, it } from 'vitest';
import { parseTechnologyDraft, toTechnologyDraft } from './technologyDraft.js';

describe('technologyDraft', () => {
  it('writes the demo profile in the form units and reads it back unchanged', () => {
    const draft = toTechnologyDraft(DEMO_TECHNOLOGY);
    expect(draft.referenceFrequencyHz).toBe('193.4');
    expect(draft.piPowerW).toBe('0.022');
    expect(parseTechnologyDraft(draft)).toEqual({ ok: true, technology: DEMO_TECHNOLOGY });
  });

  it('names every wrong field in one pass, with limits in the shown unit', () => {
    const parsed = parseTechnologyDraft({ ...toTechnologyDraft(DEMO_TECHNOLOGY), unitLengthUm: '0', lossPerGateDb: '-1', groupIndex: '', resistanceOhm: '1,2k' });
    expect(parsed).toEqual({
      ok: false,
      errors: { unitLengthUm: 'Must be more than 0 µm', lossPerGateDb: 'Must be at least 0 dB', groupIndex: 'Enter a number', resistanceOhm: '"1,2k" is not a number' },
    });
  });

  it('leaves the tolerance out when both spreads are empty and asks for both when one is given', () => {
    const draft = { ...toTechnologyDraft(DEMO_TECHNOLOGY), couplerSigmaRad: '', phaseSigmaRad: '' };
    const parsed = parseTechnologyDraft(draft);
    expect(parsed.ok && parsed.technology.tolerance).toBe(undefined);
    expect(parseTechnologyDraft({ ...draft, phaseSigmaRad: '0.02' })).toEqual({ ok: false, errors: { couplerSigmaRad: 'Give both spreads, or leave both empty' } });
    expect(parseTechnologyDraft({ ...draft, phaseSigmaRad: '2', couplerSigmaRad: '0.1' })).toEqual({ ok: false, errors: { phaseSigmaRad: 'Must be at most 1 rad' } });
  });
});
