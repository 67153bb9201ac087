// The circuits of the draft, each in its canvas colour: select, lock, remove or re-route (through the server).
import { Button, ButtonGroup, Card, Classes, NonIdealState, Tag, Tooltip } from '@blueprintjs/core';
import type { ConfigurationFile } from '@hexloom/contracts';
import { circuitColour } from '../../mesh-canvas/utils/circuitColour.js';
import { portName } from '../utils/portName.js';

type Props = {
  content: ConfigurationFile;
  selectedId: string | undefined;
  locked: ReadonlySet<string>;
  canEdit: boolean;
  /** Why remove/re-route are off (e.g. unsaved edits: the server works on saved versions), or undefined. */
  serverActionsBlocked?: string | undefined;
  busy?: string | undefined;
  onSelect: (id: string) => void;
  onToggleLock: (id: string) => void;
  onRemove: (id: string) => void;
  onReroute: (id: string) => void;
};

/** One card per circuit: colour swatch, kind, ports by the chip's names and gate count. */
export function CircuitsList({ content, selectedId, locked, canEdit, serverActionsBlocked, busy, onSelect, onToggleLock, onRemove, onReroute }: Props) {
  if (content.circuits.length === 0) return <NonIdealState icon="layout-circle" title="No circuits yet" description={canEdit ? 'Add one with "New circuit": state what you need and Hexloom synthesises and routes it.' : 'This version has no circuits.'} />;
  return (
    <ul className="hx-circuits" aria-label="Circuits" data-testid="circuits-list">
      {content.circuits.map((c, i) => {
        const isLocked = locked.has(c.id);
        const gates = new Set(c.paths.flatMap((p) => p.steps.map((s) => s.gate))).size;
        const blocked = !canEdit ? 'Your role cannot change circuits' : isLocked ? 'Unlock the circuit first' : serverActionsBlocked;
        return (
          <li key={c.id}>
            <Card compact interactive selected={c.id === selectedId} onClick={() => onSelect(c.id)} data-testid={`circuit-${c.id}`}>
              <div className="hx-row">
                <span className="hx-swatch" style={{ background: circuitColour(i) }} aria-hidden="true" />
                <button type="button" className="hx-link-button" onClick={() => onSelect(c.id)} aria-pressed={c.id === selectedId}>
                  {c.id}
                </button>
                <Tag minimal>{c.kind}</Tag>
                {isLocked && <Tag icon="lock" minimal intent="warning">locked</Tag>}
              </div>
              <p className={Classes.TEXT_MUTED}>
                {c.ports.map((p) => portName(content.mesh, p)).join(' → ')} · {gates} gates
              </p>
              {canEdit && (
                <ButtonGroup variant="minimal">
                  <Button size="small" icon={isLocked ? 'unlock' : 'lock'} text={isLocked ? 'Unlock' : 'Lock'} onClick={(e) => (e.stopPropagation(), onToggleLock(c.id))} />
                  <Tooltip content={blocked ?? 'Route it again, from its saved spec, around the other circuits'} disabled={!blocked}>
                    <Button size="small" icon="route" text="Re-route" disabled={Boolean(blocked)} loading={busy === `reroute:${c.id}`} onClick={(e) => (e.stopPropagation(), onReroute(c.id))} />
                  </Tooltip>
                  <Tooltip content={blocked ?? ''} disabled={!blocked}>
                    <Button size="small" icon="trash" intent="danger" text="Remove" disabled={Boolean(blocked)} loading={busy === `remove:${c.id}`} onClick={(e) => (e.stopPropagation(), onRemove(c.id))} />
                  </Tooltip>
                </ButtonGroup>
              )}
            </Card>
          </li>
        );
      })}
    </ul>
  );
}
