// The "new circuit" drawer: state a spec and its mask, synthesise it on the version's free gates, read the answer.
import { Drawer } from '@blueprintjs/core';
import type { FilterSpec, Proposal } from '@hexloom/contracts';
import type { ChipPort } from '../utils/portResolver.js';
import { NewCircuitPanel } from './NewCircuitPanel.js';
import './synthesis.css';

export type NewCircuitDrawerProps = {
  isOpen: boolean;
  onClose: () => void;
  teamId: string;
  configurationId: string;
  /** The version the circuit is synthesised onto. */
  versionNumber: number;
  /** Every external port of the chip; only free ones are offered, by label. */
  ports: ChipPort[];
  /** Ids of the circuits already on the version (a new id must differ). */
  existingCircuitIds: string[];
  /** Called when the user adds an accepted proposal to the workspace, with the spec it was synthesised from. */
  onAccept: (proposal: Extract<Proposal, { ok: true }>, spec: FilterSpec) => void;
};

/** A right-hand Blueprint Drawer; its form starts afresh each time it opens. */
export function NewCircuitDrawer({ isOpen, onClose, ...panel }: NewCircuitDrawerProps) {
  return (
    <Drawer isOpen={isOpen} onClose={onClose} title="New circuit" icon="new-object" size="min(900px, 100vw)" className="hx-synth-drawer">
      {isOpen && <NewCircuitPanel {...panel} onCancel={onClose} />}
    </Drawer>
  );
}
