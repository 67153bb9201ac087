// The technology form's text values: from a profile, and back to a profile checked by the shared zod schema.
import { technologyProfileSchema } from '@hexloom/contracts';
import type { TechnologyProfile } from '@hexloom/mesh';
import { formatNumber } from '../../figures/utils/formatFigure.js';
import { TECHNOLOGY_FIELDS, type TechnologyField, type TechnologyFieldKey } from './technologyFields.js';

/** What the user typed in each field, in the shown units. */
export type TechnologyDraft = Record<TechnologyFieldKey, string>;
/** A message in words for each field that is wrong. */
export type TechnologyErrors = Partial<Record<TechnologyFieldKey, string>>;
/** Either a profile in SI units ready to send, or the field errors. */
export type ParsedTechnology = { ok: true; technology: TechnologyProfile } | { ok: false; errors: TechnologyErrors };

const BY_PATH = new Map(TECHNOLOGY_FIELDS.map((f) => [f.path, f]));

function read(profile: TechnologyProfile, path: string): number | undefined {
  let value: unknown = profile;
  for (const part of path.split('.')) value = (value as Record<string, unknown> | undefined)?.[part];
  return typeof value === 'number' ? value : undefined;
}

/** The profile written in the form's units (193.4 THz, 0.022 W), without float noise. */
export function toTechnologyDraft(profile: TechnologyProfile): TechnologyDraft {
  const draft = {} as TechnologyDraft;
  for (const f of TECHNOLOGY_FIELDS) {
    const v = read(profile, f.path);
    draft[f.key] = v === undefined ? '' : String(Number((v / f.scale).toPrecision(12)));
  }
  return draft;
}

function limitWords(field: TechnologyField, value: number): string {
  return `${formatNumber(value / field.scale, 6)}${field.unit ? ` ${field.unit}` : ''}`;
}

/** A zod issue in words, with its limit in the field's unit ("Must be more than 0 µm"). */
function issueWords(issue: { code: string; message: string; minimum?: unknown; maximum?: unknown; inclusive?: boolean }, field: TechnologyField): string {
  if (issue.code === 'too_small' && typeof issue.minimum === 'number') return `Must be ${issue.inclusive ? 'at least' : 'more than'} ${limitWords(field, issue.minimum)}`;
  if (issue.code === 'too_big' && typeof issue.maximum === 'number') return `Must be ${issue.inclusive ? 'at most' : 'less than'} ${limitWords(field, issue.maximum)}`;
  return issue.message;
}

/** Reads the draft back into a profile (SI units) and checks it with `technologyProfileSchema`; errors name each bad field. */
export function parseTechnologyDraft(draft: TechnologyDraft): ParsedTechnology {
  const errors: TechnologyErrors = {};
  const values: Partial<Record<TechnologyFieldKey, number>> = {};
  for (const f of TECHNOLOGY_FIELDS) {
    const text = draft[f.key].trim();
    if (text === '') {
      if (!f.optional) errors[f.key] = 'Enter a number';
      continue;
    }
    const n = Number(text);
    if (!Number.isFinite(n)) errors[f.key] = `"${text}" is not a number`;
    else values[f.key] = n * f.scale;
  }
  const coupler = values.couplerSigmaRad;
  const phase = values.phaseSigmaRad;
  if ((coupler === undefined) !== (phase === undefined)) {
    const missing: TechnologyFieldKey = coupler === undefined ? 'couplerSigmaRad' : 'phaseSigmaRad';
    errors[missing] ??= 'Give both spreads, or leave both empty';
  }
  // Fields already wrong get a stand-in, so the schema still checks every other field in the same pass.
  for (const f of TECHNOLOGY_FIELDS) if (errors[f.key] && !f.optional) values[f.key] = f.scale;
  const candidate = {
    unitLengthUm: values.unitLengthUm,
    groupIndex: values.groupIndex,
    referenceFrequencyHz: values.referenceFrequencyHz,
    lossPerGateDb: values.lossPerGateDb,
    bendLossDb: values.bendLossDb,
    extinctionDb: values.extinctionDb,
    phaseShifter: { piPowerW: values.piPowerW, resistanceOhm: values.resistanceOhm, maxPowerW: values.maxPowerW, maxVoltageV: values.maxVoltageV },
    ...(coupler !== undefined && phase !== undefined ? { tolerance: { couplerSigmaRad: coupler, phaseSigmaRad: phase } } : {}),
  };
  const parsed = technologyProfileSchema.safeParse(candidate);
  if (parsed.success) return Object.keys(errors).length > 0 ? { ok: false, errors } : { ok: true, technology: parsed.data };
  for (const issue of parsed.error.issues) {
    const field = BY_PATH.get(issue.path.join('.'));
    if (field) errors[field.key] ??= issueWords(issue as Parameters<typeof issueWords>[0], field);
  }
  if (Object.keys(errors).length === 0) errors.unitLengthUm = parsed.error.issues[0]?.message ?? 'The profile is not valid';
  return { ok: false, errors };
}
