// MeshCanvas: one element per gate with its state class, clicks and Enter report the gate, legend, ports by label, zoom keys.
import type { ConfigurationFile, MeshDefinitionFile } from '@hexloom/contracts';
import { buildMesh, DEMO_TECHNOLOGY, makeMeshDefinition } from '@hexloom/mesh';
import { fireEvent, render, screen, within } from '@testing-library/react';
import { describe, expect, it, vi } from 'vitest';
import { CANVAS_GATE_STATES, CANVAS_GATE_STATE_WORDS } from '../utils/canvasGateState.js';
import { circuitColour } from '../utils/circuitColour.js';
import { MESH_CANVAS_SHORTCUTS } from '../utils/meshCanvasShortcuts.js';
import { MeshCanvas } from './MeshCanvas.js';

const base = makeMeshDefinition({ name: 'canvas fixture', shape: { kind: 'rectangle', rows: 2, columns: 3 }, technology: DEMO_TECHNOLOGY, io: 'left-right' });
const definition = {
  ...base,
  ports: base.ports.map((p, i) => ({ ...p, label: `${i % 2 === 0 ? 'W' : 'E'}${String(i + 1).padStart(2, '0')}`, wiredTo: i === 0 ? 'modulator' : i === 1 ? 'detector' : 'fibre' })),
  deadGates: ['g(1,0)ne'],
} as MeshDefinitionFile;
const mesh = buildMesh(definition);
const [firstPort, secondPort] = definition.ports;
const configuration: ConfigurationFile = {
  schemaVersion: 1,
  mesh: definition,
  parkedState: 'bar',
  gates: [
    { gate: 'g(0,0)e', state: 'bar', circuit: 'notch' },
    { gate: 'g(0,0)ne', state: 'cross', circuit: 'notch' },
    { gate: 'g(1,0)e', state: 'split', kappa: 0.2, circuit: 'notch' },
  ],
  circuits: [{ id: 'notch', kind: 'ring', ports: [firstPort!.id, secondPort!.id], paths: [], couplers: [{ gate: 'g(1,0)e', role: 'ring-coupler', kappa: 0.2, phaseRad: 0 }] }],
};

const gateElements = () => Array.from(document.querySelectorAll('[data-gate-id]'));

describe('MeshCanvas', () => {
  it('draws one element per gate of the mesh, classed by its state', () => {
    render(<MeshCanvas definition={definition} configuration={configuration} />);
    const gates = gateElements();
    expect(gates).toHaveLength(mesh.gates.length);
    expect(new Set(gates.map((g) => g.getAttribute('data-gate-id')))).toEqual(new Set(mesh.gates.map((g) => g.id)));
    const classOf = (id: string) => document.querySelector(`[data-gate-id="${id}"]`)?.getAttribute('class') ?? '';
    expect(classOf('g(0,0)e')).toContain('hx-mesh-gate--bar');
    expect(classOf('g(0,0)ne')).toContain('hx-mesh-gate--cross');
    expect(classOf('g(1,0)e')).toContain('hx-mesh-gate--split');
    expect(classOf('g(1,0)ne')).toContain('hx-mesh-gate--dead');
    expect(gates.filter((g) => g.getAttribute('class')?.includes('hx-mesh-gate--idle'))).toHaveLength(mesh.gates.length - 4);
  });

  it('halos the circuit gates and rings the circuit ports in the circuit colour, unless told not to', () => {
    const { unmount } = render(<MeshCanvas definition={definition} configuration={configuration} />);
    const halos = Array.from(document.querySelectorAll('.hx-mesh-gate-halo'));
    expect(halos).toHaveLength(3);
    expect(halos.every((h) => h.getAttribute('stroke') === circuitColour(0))).toBe(true);
    expect(document.querySelectorAll('.hx-mesh-port-ring')).toHaveLength(2);
    expect(within(screen.getByTestId('mesh-legend')).getByText('notch')).toBeTruthy();
    unmount();
    render(<MeshCanvas definition={definition} configuration={configuration} highlightCircuits={false} />);
    expect(document.querySelectorAll('.hx-mesh-gate-halo')).toHaveLength(0);
    expect(document.querySelector('[data-gate-id="g(0,0)e"]')?.getAttribute('class')).toContain('hx-mesh-gate--bar');
  });

  it('calls onGateClick with the gate id on a click and on Enter, with the gate named by id and state', () => {
    const onGateClick = vi.fn();
    render(<MeshCanvas definition={definition} configuration={configuration} onGateClick={onGateClick} />);
    const gate = screen.getByRole('button', { name: 'gate g(0,0)e, bar' });
    expect(gate.textContent).toBe('bar, circuit notch');
    expect(screen.getByRole('button', { name: 'gate g(1,0)e, split', description: 'split, kappa 0.2, circuit notch' })).toBeTruthy();
    expect(gate.getAttribute('tabindex')).toBe('0');
    fireEvent.click(gate);
    expect(onGateClick).toHaveBeenLastCalledWith('g(0,0)e');
    fireEvent.keyDown(screen.getByRole('button', { name: 'gate g(1,1)e, idle' }), { key: 'Enter' });
    expect(onGateClick).toHaveBeenLastCalledWith('g(1,1)e');
    expect(onGateClick).toHaveBeenCalledTimes(2);
    expect(screen.getAllByRole('button', { name: /^gate / })).toHaveLength(mesh.gates.length);
  });

  it('makes no gate a button without onGateClick', () => {
    render(<MeshCanvas definition={definition} />);
    expect(screen.queryAllByRole('button', { name: /^gate / })).toHaveLength(0);
    expect(screen.getAllByRole('img', { name: /^gate / })).toHaveLength(mesh.gates.length);
  });

  it('lists every gate state in the legend, with the wirings the chip uses', () => {
    render(<MeshCanvas definition={definition} />);
    const legend = screen.getByTestId('mesh-legend');
    const states = within(legend).getByRole('list', { name: 'Gate states' });
    expect(Array.from(states.querySelectorAll('li')).map((li) => li.getAttribute('data-state'))).toEqual([...CANVAS_GATE_STATES]);
    for (const state of CANVAS_GATE_STATES) expect(states.textContent).toContain(CANVAS_GATE_STATE_WORDS[state]);
    expect(within(legend).getByRole('list', { name: 'Port wiring' }).textContent).toBe('fibremodulatordetector');
    expect(legend.textContent).toContain('650 µm');
  });

  it("shows ports by the chip's labels and never by their internal ids", () => {
    const { container } = render(<MeshCanvas definition={definition} />);
    expect(screen.getByRole('img', { name: 'port W01, modulator' })).toBeTruthy();
    expect(screen.getByRole('img', { name: 'port E02, detector' })).toBeTruthy();
    expect(container.querySelectorAll('.hx-mesh-port')).toHaveLength(mesh.ports.length + 3);
    expect(screen.getByRole('group', { name: 'Mesh of canvas fixture' }).textContent).toContain('W01');
    for (const p of mesh.ports) expect(container.textContent).not.toContain(p.id);
  });

  it('shows a tooltip with the gate id, state and circuit on hover and on focus', () => {
    render(<MeshCanvas definition={definition} configuration={configuration} onGateClick={() => undefined} />);
    fireEvent.pointerOver(document.querySelector('[data-gate-id="g(1,0)e"] .hx-mesh-gate-hit')!);
    expect(screen.getByRole('tooltip').textContent).toBe('Gate g(1,0)e, split, kappa 0.2, circuit notch');
    fireEvent.focus(screen.getByRole('button', { name: 'gate g(1,0)ne, dead' }));
    expect(screen.getByRole('tooltip').textContent).toBe('Gate g(1,0)ne, dead');
  });

  it('zooms with + and -, fits with f, pans with the arrow keys, and lists those shortcuts', () => {
    render(<MeshCanvas definition={definition} />);
    const svg = screen.getByRole('group', { name: 'Mesh of canvas fixture' });
    const layer = svg.querySelector('g')!;
    const scale = () => Number(/scale\(([^)]+)\)/.exec(layer.getAttribute('transform') ?? '')?.[1] ?? Number.NaN);
    const fitted = scale();
    expect(fitted).toBeGreaterThan(0);
    fireEvent.keyDown(svg, { key: '+' });
    expect(scale()).toBeCloseTo(fitted * 1.25, 6);
    fireEvent.keyDown(svg, { key: '-' });
    fireEvent.keyDown(svg, { key: '-' });
    expect(scale()).toBeCloseTo(fitted / 1.25, 6);
    const before = layer.getAttribute('transform');
    fireEvent.keyDown(svg, { key: 'ArrowLeft' });
    expect(layer.getAttribute('transform')).not.toBe(before);
    fireEvent.keyDown(svg, { key: 'f' });
    expect(scale()).toBeCloseTo(fitted, 6);
    fireEvent.click(screen.getByRole('button', { name: 'Zoom in' }));
    expect(scale()).toBeCloseTo(fitted * 1.25, 6);
    expect(MESH_CANVAS_SHORTCUTS.map((s) => s.keys)).toEqual(expect.arrayContaining(['f', '+', '-', 'Arrow keys']));
  });

  it('says in words when the definition does not build', () => {
    render(<MeshCanvas definition={{ ...definition, deadGates: ['g(40,40)e'] }} />);
    expect(screen.getByRole('alert').textContent).toContain('g(40,40)e');
  });
});
