// A circuit's figures in words and units ("Insertion loss at the carrier 17.98 dB"), never raw field names.
import { Tag } from '@blueprintjs/core';
import type { FilterSpecKind } from '@hexloom/contracts';
import { FigureDefinitions } from '../../figures/components/FigureDefinitions.js';

const VERDICT = new Set(['checks', 'failedChecks']);

/** The verdict first ("All 3 checks pass" / "1 of 3 checks failed"), then the kind's figures as a definition list. */
export function FiguresList({ figures, title, kind }: { figures: Record<string, number> | undefined; title: string; kind?: FilterSpecKind | undefined }) {
  if (!figures || Object.keys(figures).length === 0) return <p className="hx-muted">No figures yet: the server computes them when the circuit has a spec and the version is saved.</p>;
  const checks = figures['checks'];
  const failed = figures['failedChecks'] ?? 0;
  return (
    <section aria-label={title}>
      {checks !== undefined && (
        <Tag intent={failed === 0 ? 'success' : 'danger'} icon={failed === 0 ? 'tick-circle' : 'error'} data-testid="circuit-verdict">
          {failed === 0 ? `All ${checks} mask and target checks pass` : `${failed} of ${checks} mask and target checks failed`}
        </Tag>
      )}
      <FigureDefinitions figures={Object.fromEntries(Object.entries(figures).filter(([name]) => !VERDICT.has(name)))} kind={kind} className="hx-figures hx-figures-panel" testId="circuit-figures" />
    </section>
  );
}
