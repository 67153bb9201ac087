/** Derives a URL slug from a team name. */

/** Lower-case ASCII letters, digits and single dashes, 2 to 40 characters (pads short results). */
export function slugify(name: string): string {
  const base = name
    .normalize('NFKD')
    .replace(/[\u0300-\u036f]/g, '')
    .toLowerCase()
    .replace(/[^a-z0-9]+/g, '-')
    .replace(/^-+|-+$/g, '')
    .slice(0, 34)
    .replace(/-+$/g, '');
  return base.length >= 2 ? base : `team-${base || 'x'}`;
}
