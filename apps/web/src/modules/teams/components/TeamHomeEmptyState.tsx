// What a team with no chips yet should do next: describe a chip, state a need, synthesise and route.
import { NonIdealState } from '@blueprintjs/core';

/** Empty state of the team home, without buttons (chips are created through the CLI and the API for now). */
export function TeamHomeEmptyState() {
  return (
    <NonIdealState
      icon="layout-hierarchy"
      title="No chips in this team yet"
      description={
        <div>
          <p>Work in Hexloom starts from the chip and moves one way:</p>
          <ol className="hx-steps">
            <li>
              <strong>Describe the chip</strong>: mesh size, wired boundary sites, loss per gate, group index, dead gates.
            </li>
            <li>
              <strong>State what you need</strong>: a filter with its mask, a delay, or a set of delays.
            </li>
            <li>
              <strong>Synthesise and route</strong> the circuit through free gates, then simulate and review it.
            </li>
          </ol>
          <p className="hx-muted">
            Start with <strong>New chip</strong>: a rectangle or hexagon of cells, or a chip file described with <code>npx hexloom mesh</code>.
          </p>
        </div>
      }
    />
  );
}
