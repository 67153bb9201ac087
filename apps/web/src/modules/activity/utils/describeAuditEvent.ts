// One audit event as a sentence ("Noor Halvorsen saved v3 of Interferer notch"), never its raw event code.
import type { AuditEvent } from '@hexloom/contracts';

/** Turns a login into the member's name (or gives the login back when the member is unknown). */
export type NameOf = (login: string) => string;

const text = (value: unknown): string | undefined => (typeof value === 'string' && value !== '' ? value : undefined);
const num = (value: unknown): number | undefined => (typeof value === 'number' && Number.isFinite(value) ? value : undefined);
const words = (field: string): string => field.replace(/([a-z])([A-Z])/g, '$1 $2').toLowerCase();
const list = (items: readonly string[]): string => (items.length <= 1 ? (items[0] ?? '') : `${items.slice(0, -1).join(', ')} and ${items.at(-1)}`);
const roleWord = (value: unknown): string => text(value) ?? 'a member';

type Sentence = (e: AuditEvent, target: string, nameOf: NameOf) => string;

/** The predicate after the actor's name, per action; `target` is the event's target or "something". */
const SENTENCES: Record<string, Sentence> = {
  'auth.signed_in': () => 'signed in',
  'auth.signed_out': () => 'signed out',
  'team.created': (e, t) => `created the team ${text(e.detail['name']) ?? t}`,
  'member.role_changed': (e, t, n) => `changed the role of ${n(t)} from ${roleWord(e.detail['from'])} to ${roleWord(e.detail['to'])}`,
  'member.removed': (_e, t, n) => `removed ${n(t)} from the team`,
  'invitation.created': (e, t) => `invited ${t} to join as ${roleWord(e.detail['role'])}`,
  'invitation.revoked': (_e, t) => `withdrew the invitation of ${t}`,
  'invitation.accepted': (e) => `joined the team as ${roleWord(e.detail['role'])}`,
  'chip.created': (_e, t) => `created the chip ${t}`,
  'chip.updated': (e, t) => {
    const fields = Array.isArray(e.detail['fields']) ? e.detail['fields'].filter((f): f is string => typeof f === 'string').map(words) : [];
    return fields.length > 0 ? `changed the ${list(fields)} of the chip ${t}` : `changed the chip ${t}`;
  },
  'calibration.uploaded': (e, t) => {
    const shifters = num(e.detail['shifters']);
    return `uploaded a calibration${shifters !== undefined ? ` of ${shifters} phase shifters` : ''} for the chip ${t}`;
  },
  'configuration.created': (_e, t) => `created the configuration ${t}`,
  'configuration.duplicated': (e, t) => {
    const from = num(e.detail['fromVersion']);
    return `made the configuration ${t} as a copy${from !== undefined ? ` of v${from}` : ''} of another one`;
  },
  'version.saved': (e, t) => {
    const v = num(e.detail['version']);
    return v !== undefined ? `saved v${v} of ${t}` : `saved a new version of ${t}`;
  },
  'review.requested': (e, t, n) => {
    const reviewers = Array.isArray(e.detail['reviewers']) ? e.detail['reviewers'].filter((r): r is string => typeof r === 'string').map(n) : [];
    return reviewers.length > 0 ? `asked ${list(reviewers)} to review ${t}` : `asked for a review of ${t}`;
  },
  'review.decided': (e, t) => (e.detail['decision'] === 'approve' ? `approved ${t}` : `requested changes to ${t}`),
  'comment.created': (_e, t) => `commented on ${t}`,
  'comment.resolved': (_e, t) => `resolved a comment thread on ${t}`,
  'comment.reopened': (_e, t) => `reopened a comment thread on ${t}`,
  'measurement.uploaded': (e, t) => {
    const v = num(e.detail['version']);
    const points = num(e.detail['points']);
    return `uploaded the bench measurement ${t}${points !== undefined ? ` (${points} points)` : ''}${v !== undefined ? ` for v${v}` : ''}`;
  },
  'yield_job.started': (e, t) => {
    const runs = num(e.detail['runs']);
    return `started a yield estimate${runs !== undefined ? ` of ${runs} runs` : ''} on ${t}`;
  },
  'yield_job.cancelled': (_e, t) => `cancelled a yield estimate on ${t}`,
};

/**
 * "Noor Halvorsen saved v3 of Interferer notch": the actor by name (a deleted account is "A former member"), then
 * what they did in words; an action this page does not know yet reads "made a change to <target>".
 */
export function describeAuditEvent(event: AuditEvent, nameOf: NameOf): string {
  const actor = event.actor ? nameOf(event.actor) : 'A former member';
  const target = event.target ?? 'something';
  const sentence = SENTENCES[event.action];
  return `${actor} ${sentence ? sentence(event, target, nameOf) : event.target ? `made a change to ${event.target}` : 'made a change'}`;
}
