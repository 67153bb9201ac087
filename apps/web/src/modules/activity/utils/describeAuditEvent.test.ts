// describeAuditEvent: every audited action of the server reads as a sentence, with names instead of logins.
import type { AuditEvent } from '@hexloom/contracts';
import { describe, expect, it } from 'vitest';
import { describeAuditEvent } from './describeAuditEvent.js';

const NAMES: Record<string, string> = { noor: 'Noor Halvorsen', ilse: 'Ilse Marrow' };
const nameOf = (login: string) => NAMES[login] ?? login;
const event = (action: string, target: string | null, detail: Record<string, unknown> = {}, actor: string | null = 'noor'): AuditEvent => ({ id: '00000000-0000-4000-8000-000000000001', at: '2026-12-02T10:00:00.000Z', actor, action, target, detail });

describe('describeAuditEvent', () => {
  it.each([
    [event('team.created', 'kestrel-vale', { name: 'Kestrel Vale' }), 'Noor Halvorsen created the team Kestrel Vale'],
    [event('member.removed', 'ilse', { role: 'owner' }), 'Noor Halvorsen removed Ilse Marrow from the team'],
    [event('invitation.created', 'pia@studio.example', { role: 'reviewer' }), 'Noor Halvorsen invited pia@studio.example to join as reviewer'],
    [event('invitation.revoked', 'pia@studio.example', { role: 'reviewer' }), 'Noor Halvorsen withdrew the invitation of pia@studio.example'],
    [event('invitation.accepted', 'pia@studio.example', { role: 'viewer' }, 'pia'), 'pia joined the team as viewer'],
    [event('chip.created', 'Demo mesh'), 'Noor Halvorsen created the chip Demo mesh'],
    [event('chip.updated', 'Demo mesh', { fields: ['name', 'technology'] }), 'Noor Halvorsen changed the name and technology of the chip Demo mesh'],
    [event('calibration.uploaded', 'Demo mesh', { fileName: 'cal.csv', shifters: 12 }), 'Noor Halvorsen uploaded a calibration of 12 phase shifters for the chip Demo mesh'],
    [event('configuration.created', 'Interferer notch'), 'Noor Halvorsen created the configuration Interferer notch'],
    [event('configuration.duplicated', 'Notch copy', { fromVersion: 2 }), 'Noor Halvorsen made the configuration Notch copy as a copy of v2 of another one'],
    [event('review.decided', 'Interferer notch v2', { decision: 'approve' }, 'ilse'), 'Ilse Marrow approved Interferer notch v2'],
    [event('comment.created', 'Interferer notch v2'), 'Noor Halvorsen commented on Interferer notch v2'],
    [event('comment.resolved', 'Interferer notch v2'), 'Noor Halvorsen resolved a comment thread on Interferer notch v2'],
    [event('measurement.uploaded', 'bench-run.csv', { version: 2, points: 801 }), 'Noor Halvorsen uploaded the bench measurement bench-run.csv (801 points) for v2'],
    [event('yield_job.started', 'Interferer notch v2', { runs: 500, seed: 7 }), 'Noor Halvorsen started a yield estimate of 500 runs on Interferer notch v2'],
    [event('yield_job.cancelled', 'Interferer notch v2'), 'Noor Halvorsen cancelled a yield estimate on Interferer notch v2'],
    [event('version.saved', 'Interferer notch', {}, null), 'A former member saved a new version of Interferer notch'],
    [event('not.known_yet', null), 'Noor Halvorsen made a change'],
  ])('%# %s', (input, sentence) => {
    expect(describeAuditEvent(input, nameOf)).toBe(sentence);
  });
});
