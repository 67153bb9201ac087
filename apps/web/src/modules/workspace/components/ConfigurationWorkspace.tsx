// The configuration workspace: the chip with its circuits, a gate or circuit panel, the live response, gates and versions.
import { Alert, Button, ButtonGroup, Callout, Tab, Tabs, Tooltip } from '@blueprintjs/core';
import type { CircuitSpec, ConfigurationDetail, ConfigurationFile, ConfigurationVersion, MyTeam, ShifterCalibrationBody } from '@hexloom/contracts';
import { useMemo, useState } from 'react';
import { MeshCanvas } from '../../mesh-canvas/components/MeshCanvas.js';
import { MESH_CANVAS_SHORTCUTS } from '../../mesh-canvas/utils/meshCanvasShortcuts.js';
import { NewCircuitDrawer } from '../../synthesis/components/NewCircuitDrawer.js';
import { StatusTag } from '../../chips/components/StatusTag.js';
import { useCircuitAction } from '../api/useCircuitAction.js';
import { useSaveVersion } from '../api/useSaveVersion.js';
import { useUndoableDraft } from '../hooks/useUndoableDraft.js';
import { useUnsavedChangesGuard } from '../hooks/useUnsavedChangesGuard.js';
import { useWorkspaceKeys } from '../hooks/useWorkspaceKeys.js';
import { portChoices } from '../utils/portChoices.js';
import { WORKSPACE_SHORTCUTS } from '../utils/workspaceShortcuts.js';
import { CircuitsList } from './CircuitsList.js';
import { FiguresList } from './FiguresList.js';
import { GateInspector } from './GateInspector.js';
import { GateTable } from './GateTable.js';
import { SaveVersionDialog } from './SaveVersionDialog.js';
import { ShortcutsDialog } from './ShortcutsDialog.js';
import { VersionsPanel } from '../../versions/components/VersionsPanel.js';
import { WorkspaceResponse } from './WorkspaceResponse.js';
import { ApiErrorCallout } from '../../core/components/ApiErrorCallout.js';
import { YieldPanel } from '../../yield/components/YieldPanel.js';
import { ReviewPanel } from '../../review/components/ReviewPanel.js';
import { useComments } from '../../review/api/useComments.js';
import { gatePins } from '../../review/utils/gatePins.js';
import { bandShades } from '../../review/utils/bandShades.js';
import { useTeamMembers } from '../../teams/api/useTeamMembers.js';
import { useMe } from '../../auth/api/useMe.js';
import { BenchPanel } from '../../bench/components/BenchPanel.js';
import { MeasuredPanel } from '../../measured/components/MeasuredPanel.js';
import '../workspace.css';

type Props = {
  team: MyTeam;
  detail: ConfigurationDetail;
  version: ConfigurationVersion;
  calibration?: readonly ShifterCalibrationBody[] | undefined;
  onOpenVersion: (n: number) => void;
};

/** Edits stay in the browser (undo/redo) until "Save as a new version"; server actions work on the saved version. */
export function ConfigurationWorkspace({ team, detail, version, calibration, onOpenVersion }: Props) {
  const canEdit = team.role === 'owner' || team.role === 'designer';
  const history = useUndoableDraft({ content: version.content, specs: version.specs, figures: version.figures });
  const { draft } = history;
  const [circuitId, setCircuitId] = useState<string | undefined>(version.content.circuits[0]?.id);
  const [gateId, setGateId] = useState<string | undefined>(undefined);
  const [locked, setLocked] = useState<ReadonlySet<string>>(new Set());
  const [drawerOpen, setDrawerOpen] = useState(false);
  const [saveOpen, setSaveOpen] = useState(false);
  const [helpOpen, setHelpOpen] = useState(false);
  const me = useMe();
  const members = useTeamMembers(team.id);
  const comments = useComments(team.id, detail.id, version.number);
  const commentBands = useMemo(() => bandShades(comments.data ?? []).map((b) => ({ fromHz: b.fromHz, toHz: b.toHz, label: comments.data?.find((c) => c.id === b.commentId)?.body ?? '' })), [comments.data]);
  const pinnedGates = useMemo(() => gatePins(comments.data ?? []).filter((p) => !p.resolved).map((p) => p.gateId), [comments.data]);
  const save = useSaveVersion(team.id, detail.id, (saved) => (setSaveOpen(false), onOpenVersion(saved.number)));
  const action = useCircuitAction(team.id, detail.id, version.number);
  const blocker = useUnsavedChangesGuard(history.dirty && !save.isSuccess);
  const selected = draft.content.circuits.some((c) => c.id === circuitId) ? circuitId : draft.content.circuits[0]?.id;
  const spec = draft.specs.find((s) => s.circuitId === selected)?.spec;
  const gateCircuit = gateId ? draft.content.gates.find((g) => g.gate === gateId)?.circuit : undefined;
  const ports = useMemo(() => portChoices(draft.content), [draft.content]);
  const setContent = (content: ConfigurationFile, key?: string): void => history.edit({ ...draft, content }, key);
  const accept = (content: ConfigurationFile, specs: CircuitSpec[], figures: typeof draft.figures, id: string | null): void => {
    history.edit({ content, specs, figures });
    if (id) setCircuitId(id);
  };
  const runAction = (kind: 'remove' | 'reroute', id: string): void =>
    action.mutate({ action: kind, circuitId: id }, { onSuccess: (p) => p.ok && accept(p.content, p.specs, p.figures, kind === 'reroute' ? id : null) });
  const doSave = (note: string): void =>
    save.mutate({ baseVersion: version.number, content: draft.content, specs: draft.specs, note });
  const keys = useMemo(
    () => ({ undo: history.undo, redo: history.redo, save: () => canEdit && history.dirty && setSaveOpen(true), newCircuit: () => canEdit && !history.dirty && setDrawerOpen(true), clear: () => setGateId(undefined), help: () => setHelpOpen(true) }),
    [history.undo, history.redo, history.dirty, canEdit],
  );
  useWorkspaceKeys(keys);
  const newer = detail.headVersion > version.number;
  const proposalFailed = action.data && !action.data.ok ? action.data : undefined;
  return (
    <div className="hx-stack hx-workspace-root" data-testid="configuration-workspace">
      <header className="hx-page-header hx-workspace-header">
        <div>
          <h1>{detail.name}</h1>
          <span className="hx-muted">
            v{version.number} <StatusTag status={version.status} /> {history.dirty && <strong data-testid="unsaved">· unsaved edits</strong>}
          </span>
        </div>
        <ButtonGroup className="hx-toolbar" aria-label="Workspace actions">
          {canEdit && (
            <Tooltip content={history.dirty ? 'Save or undo your edits first: synthesis works on a saved version' : 'New circuit (N)'}>
              <Button icon="add" intent="primary" text="New circuit" disabled={history.dirty} onClick={() => setDrawerOpen(true)} data-testid="new-circuit" />
            </Tooltip>
          )}
          <Button icon="undo" aria-label="Undo (Ctrl+Z)" title="Undo (Ctrl+Z)" disabled={!history.canUndo} onClick={history.undo} />
          <Button icon="redo" aria-label="Redo (Ctrl+Shift+Z)" title="Redo (Ctrl+Shift+Z)" disabled={!history.canRedo} onClick={history.redo} />
          {canEdit && <Button icon="floppy-disk" text="Save as new version" disabled={!history.dirty} onClick={() => setSaveOpen(true)} data-testid="save-version" />}
          <Button icon="key-command" aria-label="Keyboard shortcuts (?)" title="Keyboard shortcuts (?)" onClick={() => setHelpOpen(true)} />
        </ButtonGroup>
      </header>
      {newer && (
        <Callout intent="primary" icon="history">
          You are looking at v{version.number}; the newest is v{detail.headVersion}. <Button variant="minimal" text={`Open v${detail.headVersion}`} onClick={() => onOpenVersion(detail.headVersion)} />
        </Callout>
      )}
      {version.deadGatesInUse.length > 0 && <Callout intent="warning" title="Dead gates in use">This version routes through gates the chip now marks dead ({version.deadGatesInUse.join(', ')}): re-route its circuits before it goes to the bench.</Callout>}
      <ApiErrorCallout error={action.error} title="The server could not change the circuit" />
      {proposalFailed && <Callout intent="warning" title="The circuit could not be changed">{proposalFailed.message}</Callout>}
      <Tabs id="workspace-tabs" renderActiveTabPanelOnly large={false}>
        <Tab
          id="design"
          title="Design"
          panel={
            <div className="hx-stack">
              <div className="hx-workspace">
                <MeshCanvas definition={draft.content.mesh} configuration={draft.content} {...(gateId ? { selectedGateId: gateId } : {})} onGateClick={setGateId} highlightGateIds={pinnedGates} highlightLabel="Gate with an open comment" height={460} ariaLabel={`Mesh of ${detail.name}`} />
                <aside className="hx-side-panel" aria-label="Details">
                  {gateId ? (
                    <>
                      <GateInspector content={draft.content} gateId={gateId} readOnlyReason={!canEdit ? 'Your role can look but not change gates.' : gateCircuit && locked.has(gateCircuit) ? `Circuit ${gateCircuit} is locked.` : undefined} onChange={setContent} />
                      <Button variant="minimal" icon="cross" text="Close gate" onClick={() => setGateId(undefined)} />
                    </>
                  ) : (
                    <>
                      <h2 className="hx-panel-title">Circuits</h2>
                      <CircuitsList
                        content={draft.content}
                        selectedId={selected}
                        locked={locked}
                        canEdit={canEdit}
                        serverActionsBlocked={history.dirty ? 'Save or undo your edits first: the server works on saved versions' : undefined}
                        busy={action.isPending && action.variables ? `${action.variables.action}:${action.variables.circuitId}` : undefined}
                        onSelect={setCircuitId}
                        onToggleLock={(id) => setLocked((s) => (s.has(id) ? new Set([...s].filter((x) => x !== id)) : new Set([...s, id])))}
                        onRemove={(id) => runAction('remove', id)}
                        onReroute={(id) => runAction('reroute', id)}
                      />
                      {selected && <FiguresList figures={draft.figures[selected]} title={`Figures of ${selected}`} kind={spec?.spec.kind} />}
                    </>
                  )}
                </aside>
              </div>
              <WorkspaceResponse content={draft.content} circuitId={selected} mask={spec?.mask} bands={commentBands} tunable={canEdit && !!selected && !locked.has(selected)} onTune={(c) => setContent(c, `tune:${selected}`)} />
            </div>
          }
        />
        <Tab id="gates" title="Gates" panel={<GateTable content={draft.content} {...(calibration ? { calibration } : {})} onSelectGate={setGateId} />} />
        <Tab
          id="review"
          title="Review"
          panel={<ReviewPanel teamId={team.id} configurationId={detail.id} version={version} members={members.data} meLogin={me.data?.user.login ?? ''} role={team.role} {...(gateId ? { selectedGateId: gateId } : {})} onPinGate={setGateId} />}
        />
        <Tab id="bench" title="Bench" panel={<BenchPanel teamId={team.id} configurationId={detail.id} version={version} chipId={detail.chipId} />} />
        <Tab id="measured" title="Measured" panel={<MeasuredPanel teamId={team.id} configurationId={detail.id} version={version} canUpload={team.role !== 'viewer'} />} />
        <Tab id="yield" title="Yield" panel={<YieldPanel teamId={team.id} configurationId={detail.id} version={version} role={team.role} />} />
        <Tab id="versions" title={`Versions (${detail.versions.length})`} panel={<VersionsPanel teamId={team.id} teamSlug={team.slug} detail={detail} current={version.number} onOpen={onOpenVersion} />} />
      </Tabs>
      {canEdit && (
        <NewCircuitDrawer
          isOpen={drawerOpen}
          onClose={() => setDrawerOpen(false)}
          teamId={team.id}
          configurationId={detail.id}
          versionNumber={version.number}
          ports={ports}
          existingCircuitIds={draft.content.circuits.map((c) => c.id)}
          onAccept={(p) => (accept(p.content, p.specs, p.figures, p.circuit?.id ?? null), setDrawerOpen(false))}
        />
      )}
      <SaveVersionDialog isOpen={saveOpen} baseVersion={version.number} saving={save.isPending} error={save.error} onClose={() => setSaveOpen(false)} onSave={doSave} latestVersion={detail.headVersion} />
      <ShortcutsDialog isOpen={helpOpen} onClose={() => setHelpOpen(false)} groups={[{ title: 'Workspace', shortcuts: WORKSPACE_SHORTCUTS }, { title: 'Canvas', shortcuts: MESH_CANVAS_SHORTCUTS }]} />
      <Alert isOpen={blocker.state === 'blocked'} intent="danger" icon="warning-sign" confirmButtonText="Leave and lose the edits" cancelButtonText="Stay" onConfirm={() => blocker.proceed?.()} onCancel={() => blocker.reset?.()}>
        This workspace has unsaved edits. Leave anyway?
      </Alert>
    </div>
  );
}
