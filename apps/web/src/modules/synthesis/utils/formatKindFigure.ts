// A figure of a spec kind's output in words, with that kind's own label ("off-resonance insertion loss" for a notch).
import { FIGURE_CATALOGUE, type FilterSpecKind } from '@hexloom/contracts';
import { formatFigure, formatQuantity, type FormattedFigure } from '../../figures/utils/formatFigure.js';

/** Like formatFigure, but a name several kinds share ("insertionLossDb") takes the label of `kind`. */
export function formatKindFigure(kind: FilterSpecKind | undefined, name: string, value: number): FormattedFigure {
  const [base = name, port] = name.split('@');
  const definition = kind ? FIGURE_CATALOGUE[kind].find((d) => d.name === base) : undefined;
  if (!definition) return formatFigure(name, value);
  const label = `${definition.label.charAt(0).toUpperCase()}${definition.label.slice(1)}${port ? ` (${port})` : ''}`;
  return { name, label, text: formatQuantity(value, definition.unit) };
}
