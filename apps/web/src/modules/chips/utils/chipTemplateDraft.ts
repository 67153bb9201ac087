// The template fields of the new-chip dialog, turned into the POST /chips body the shared schema accepts.
import { createChipSchema, type CreateChip } from '@hexloom/contracts';
import { makeMeshDefinition, type TechnologyProfile } from '@hexloom/mesh';

/** What the user typed for a template chip. */
export type TemplateDraft = { name: string; shape: 'rectangle' | 'hexagon'; rows: string; columns: string; radius: string; io: 'left-right' | 'all' };
/** Messages in words for the wrong template fields. */
export type TemplateErrors = Partial<Record<'name' | 'rows' | 'columns' | 'radius', string>>;

/** A 6 x 4 rectangle wired on its west and east sides. */
export const DEFAULT_TEMPLATE: TemplateDraft = { name: '', shape: 'rectangle', rows: '4', columns: '6', radius: '2', io: 'left-right' };

const FIELD_OF_PATH: Record<string, keyof TemplateErrors> = {
  name: 'name',
  'template.rows': 'rows',
  'template.columns': 'columns',
  'definition.name': 'name',
  'definition.shape.radius': 'radius',
};

function words(issue: { code: string; message: string; minimum?: unknown; maximum?: unknown }): string {
  if (issue.code === 'too_small' && typeof issue.minimum === 'number') return `Must be at least ${issue.minimum}`;
  if (issue.code === 'too_big' && typeof issue.maximum === 'number') return `Must be at most ${issue.maximum}`;
  if (issue.code === 'invalid_type') return 'Enter a whole number';
  return issue.message;
}

/**
 * A rectangle becomes `{ name, template, technology }`; a hexagon, which the template route does not take, becomes a
 * full `{ definition }` made here by libs/mesh. Both are checked by `createChipSchema` before anything is sent.
 */
export function chipTemplateBody(draft: TemplateDraft, technology: TechnologyProfile): { ok: true; body: CreateChip } | { ok: false; errors: TemplateErrors } {
  const name = draft.name.trim();
  const int = (text: string) => (/^\s*-?\d+\s*$/.test(text) ? Number(text) : Number.NaN);
  let candidate: unknown;
  if (draft.shape === 'rectangle') candidate = { name, template: { rows: int(draft.rows), columns: int(draft.columns), io: draft.io }, technology };
  else {
    const radius = int(draft.radius);
    if (!Number.isInteger(radius) || radius < 0 || radius > 300) return { ok: false, errors: { radius: 'Enter a whole number from 0 to 300', ...(name ? {} : { name: 'Give the chip a name' }) } };
    if (!name) return { ok: false, errors: { name: 'Give the chip a name' } };
    try {
      candidate = { definition: makeMeshDefinition({ name, shape: { kind: 'hexagon', radius }, technology, io: draft.io }) };
    } catch (error) {
      return { ok: false, errors: { radius: error instanceof Error ? error.message : String(error) } };
    }
  }
  const parsed = createChipSchema.safeParse(candidate);
  if (parsed.success) return { ok: true, body: parsed.data };
  const errors: TemplateErrors = {};
  for (const issue of parsed.error.issues) {
    for (const union of 'errors' in issue && Array.isArray(issue.errors) ? (issue.errors as { path: PropertyKey[]; code: string; message: string }[][]).flat() : [issue]) {
      const key = FIELD_OF_PATH[union.path.join('.')];
      if (key) errors[key] ??= key === 'name' && name === '' ? 'Give the chip a name' : words(union);
    }
  }
  if (Object.keys(errors).length === 0) errors.name = parsed.error.issues[0]?.message ?? 'The chip is not valid';
  return { ok: false, errors };
}
