// One chip: its mesh, and tabs for the technology profile, the calibration and the dead gates.
import { Button, Tab, Tabs, Tag } from '@blueprintjs/core';
import type { Chip } from '@hexloom/contracts';
import { useMemo, useState } from 'react';
import { MeshCanvas } from '../../mesh-canvas/components/MeshCanvas.js';
import { useUpdateChip } from '../api/useUpdateChip.js';
import { describeShape } from '../utils/describeShape.js';
import { AffectedVersionsCallout } from './AffectedVersionsCallout.js';
import { CalibrationPanel } from './CalibrationPanel.js';
import { DeadGatesPanel } from './DeadGatesPanel.js';
import { MeshShortcutsDialog } from './MeshShortcutsDialog.js';
import { TechnologyForm } from './TechnologyForm.js';
import './chips.css';

type ChipTab = 'technology' | 'calibration' | 'dead-gates';

export type ChipDetailProps = { teamId: string; teamSlug: string; chip: Chip; canEdit: boolean };

/** Header, the mesh canvas (clickable gates on the Dead gates tab for editors) and the three tabs. */
export function ChipDetail({ teamId, teamSlug, chip, canEdit }: ChipDetailProps) {
  const [tab, setTab] = useState<ChipTab>('technology');
  const [deadDraft, setDeadDraft] = useState<string[] | null>(null);
  const [selectedGateId, setSelectedGateId] = useState<string>();
  const [helpOpen, setHelpOpen] = useState(false);
  const update = useUpdateChip(teamId, chip.id);
  const deadGates = deadDraft ?? chip.definition.deadGates;
  const definition = useMemo(() => (deadDraft ? { ...chip.definition, deadGates: deadDraft } : chip.definition), [chip.definition, deadDraft]);
  const dirty = deadDraft !== null && [...deadDraft].sort().join() !== [...chip.definition.deadGates].sort().join();

  const toggleDead = (gateId: string) => {
    setSelectedGateId(gateId);
    setDeadDraft((d) => {
      const current = d ?? chip.definition.deadGates;
      return current.includes(gateId) ? current.filter((g) => g !== gateId) : [...current, gateId].sort();
    });
  };
  const editingDead = tab === 'dead-gates' && canEdit;
  const { ports } = chip.definition;
  return (
    <div className="hx-stack" data-testid="chip-detail">
      <header className="hx-page-header" style={{ marginBottom: 0 }}>
        <h1>{chip.name}</h1>
        <span className="hx-muted">
          {describeShape(chip.definition.shape)} · {ports.length} ports · revision {chip.revision} · created by {chip.createdBy}
        </span>
        <Tag minimal intent={chip.hasCalibration ? 'success' : 'warning'}>{chip.hasCalibration ? 'calibrated' : 'no calibration'}</Tag>
        {!canEdit && <Tag minimal>read only</Tag>}
      </header>
      <AffectedVersionsCallout chip={chip} teamSlug={teamSlug} />
      <div className="hx-row" style={{ justifyContent: 'space-between' }}>
        <span className="hx-muted">{editingDead ? 'Click gates to mark them dead or working.' : 'Hover or focus a gate to see its id and state.'}</span>
        <Button variant="minimal" icon="key-command" text="Keyboard shortcuts" onClick={() => setHelpOpen(true)} />
      </div>
      <MeshCanvas
        definition={definition}
        height={440}
        ariaLabel={`Mesh of ${chip.name}`}
        selectedGateId={editingDead ? selectedGateId : undefined}
        onGateClick={editingDead ? toggleDead : undefined}
      />
      <Tabs id="chip-tabs" className="hx-chip-tabs" selectedTabId={tab} onChange={(id) => setTab(id as ChipTab)} renderActiveTabPanelOnly large>
        <Tab id="technology" title="Technology" panel={<TechnologyForm teamId={teamId} chip={chip} canEdit={canEdit} />} />
        <Tab id="calibration" title="Calibration" panel={<CalibrationPanel teamId={teamId} chip={chip} canEdit={canEdit} />} />
        <Tab
          id="dead-gates"
          title={`Dead gates (${deadGates.length})`}
          panel={
            <DeadGatesPanel
              deadGates={deadGates}
              dirty={dirty}
              canEdit={canEdit}
              onRemove={toggleDead}
              onReset={() => setDeadDraft(null)}
              onSave={() => update.mutate({ deadGates: [...deadGates] }, { onSuccess: () => setDeadDraft(null) })}
              isSaving={update.isPending}
              error={update.error}
            />
          }
        />
      </Tabs>
      <MeshShortcutsDialog isOpen={helpOpen} onClose={() => setHelpOpen(false)} />
    </div>
  );
}
