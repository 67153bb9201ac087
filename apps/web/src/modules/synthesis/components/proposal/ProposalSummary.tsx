// The verdict of a synthesis and what was built: path lengths, ring or arm sizes, FSR.
import { Tag } from '@blueprintjs/core';
import type { Proposal } from '@hexloom/contracts';
import { formatFrequencyHz, formatNumber } from '../../../figures/utils/formatFigure.js';
import { realisedLengths } from '../../utils/realisedLengths.js';

type Props = { proposal: Extract<Proposal, { ok: true }> };

const FSR_WORDS = { ring: 'Ring FSR', lattice: 'Lattice FSR', unit: 'Unit FSR of the mesh' } as const;

/** Verdict tag, then a definition list of realised sizes. */
export function ProposalSummary({ proposal }: Props) {
  const sizes = realisedLengths(proposal);
  const verdict = proposal.verdict;
  return (
    <div className="hx-stack" data-testid="proposal-summary">
      {verdict && (
        <p className="hx-synth-verdict">
          <Tag large intent={verdict.pass ? 'success' : 'danger'} icon={verdict.pass ? 'tick-circle' : 'error'} data-testid="verdict">
            {verdict.pass ? 'Pass' : 'Fail'}
          </Tag>{' '}
          {verdict.pass ? `All ${verdict.checks} checks met.` : `${verdict.failed} of ${verdict.checks} checks failed.`}
        </p>
      )}
      <dl className="hx-figures" data-testid="realised-lengths">
        {proposal.circuit && (
          <div>
            <dt>Circuit</dt>
            <dd>
              {proposal.circuit.id}, {proposal.circuit.kind.replace(/-/g, ' ')}
            </dd>
          </div>
        )}
        {sizes.paths.map((path) => (
          <div key={path.label}>
            <dt>{path.label} length</dt>
            <dd className="hx-mono">
              {path.units} units ({formatNumber(path.lengthMm)} mm)
            </dd>
          </div>
        ))}
        {sizes.perimeterUnits !== undefined && (
          <div>
            <dt>Ring perimeter</dt>
            <dd className="hx-mono">{sizes.perimeterUnits} units</dd>
          </div>
        )}
        {sizes.armDifferenceUnits !== undefined && (
          <div>
            <dt>Arm length difference per stage</dt>
            <dd className="hx-mono">{sizes.armDifferenceUnits} units</dd>
          </div>
        )}
        <div>
          <dt>{FSR_WORDS[sizes.fsrOf]}</dt>
          <dd className="hx-mono">{formatFrequencyHz(sizes.fsrHz)}</dd>
        </div>
      </dl>
    </div>
  );
}
