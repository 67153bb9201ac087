// One verified output of a synthesised circuit: its checks (measured, limit, margin, worst frequency) and figures in words.
import { Card, HTMLTable, Tag } from '@blueprintjs/core';
import type { FilterSpecKind, OutputVerification } from '@hexloom/contracts';
import { formatFrequencyHz, formatQuantity } from '../../../figures/utils/formatFigure.js';
import { FigureDefinitions } from '../../../figures/components/FigureDefinitions.js';

const CHECK_KINDS = { pass: 'Pass band', stop: 'Stop band', delay: 'Group delay', target: 'Spec target' } as const;

const sentence = (text: string) => `${text.charAt(0).toUpperCase()}${text.slice(1)}`;

/** A card per output: "W03 to E03 (main output)", a checks table, and the kind's figures. */
export function OutputVerificationCard({ output, kind }: { output: OutputVerification; kind?: FilterSpecKind | undefined }) {
  const title = `${output.fromName} to ${output.toName}`;
  return (
    <Card compact className="hx-stack" data-testid={`output-${output.toName}`}>
      <h4 className="hx-synth-output-title">
        {title} <span className="hx-muted">({output.role === 'main' ? 'main output' : 'through port'})</span>{' '}
        <Tag minimal intent={output.pass ? 'success' : 'danger'}>
          {output.pass ? 'Pass' : 'Fail'}
        </Tag>
      </h4>
      {output.checks.length > 0 && (
        <div className="hx-synth-mask-scroll">
          <HTMLTable compact className="hx-full-width" aria-label={`Checks of ${title}`}>
            <thead>
              <tr>
                <th scope="col">Check</th>
                <th scope="col">Measured</th>
                <th scope="col">Limit</th>
                <th scope="col">Margin</th>
                <th scope="col">Worst at (offset)</th>
                <th scope="col">Result</th>
              </tr>
            </thead>
            <tbody>
              {output.checks.map((check, k) => (
                <tr key={k}>
                  <td>
                    {sentence(check.quantity)} <span className="hx-muted">({CHECK_KINDS[check.kind]})</span>
                  </td>
                  <td className="hx-mono">{formatQuantity(check.measured, check.unit)}</td>
                  <td className="hx-mono">
                    {check.direction === 'at-most' ? 'at most' : 'at least'} {formatQuantity(check.limit, check.unit)}
                  </td>
                  <td className="hx-mono">{formatQuantity(check.margin, check.unit)}</td>
                  <td className="hx-mono">{formatFrequencyHz(check.worstFrequencyHz)}</td>
                  <td>{check.pass ? 'Met' : 'Missed'}</td>
                </tr>
              ))}
            </tbody>
          </HTMLTable>
        </div>
      )}
      <FigureDefinitions figures={output.figures} kind={kind} />
    </Card>
  );
}
