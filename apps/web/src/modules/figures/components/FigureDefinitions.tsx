// Figures as a definition list: each one's label in words over its value with the unit.
import type { FilterSpecKind } from '@hexloom/contracts';
import { formatFigure } from '../utils/formatFigure.js';

type Props = { figures: Record<string, number>; kind?: FilterSpecKind | undefined; className?: string; testId?: string };

/** One `<dt>`/`<dd>` pair per figure, in the order given. */
export function FigureDefinitions({ figures, kind, className = 'hx-figures', testId }: Props) {
  return (
    <dl className={className} data-testid={testId}>
      {Object.entries(figures).map(([name, value]) => {
        const figure = formatFigure(name, value, kind);
        return (
          <div key={name}>
            <dt>{figure.label}</dt>
            <dd className="hx-mono">{figure.text}</dd>
          </div>
        );
      })}
    </dl>
  );
}
