import type { ConfigurationFile } from '@hexloom/contracts';
import { describe, expect, it } from 'vitest';
import { diffVersions, type DiffSide } from './diff-versions.js';

const mesh = { schemaVersion: 1, name: 'm', shape: { kind: 'hexagon', radius: 1 }, technology: {}, ioSites: [], ports: [], deadGates: [] } as unknown as ConfigurationFile['mesh'];
const circuit = (id: string, gate: string): ConfigurationFile['circuits'][number] => ({ id, kind: 'path', ports: [], paths: [{ role: 'bus', from: { gate, at: 'a0' }, to: { gate, at: 'a1' }, steps: [] }], couplers: [] });
const side = (number: number, content: Partial<ConfigurationFile>, figures: DiffSide['figures'] = {}): DiffSide => ({
  number,
  content: { schemaVersion: 1, mesh, parkedState: 'bar', gates: [], circuits: [], ...content },
  figures,
});

describe('diffVersions', () => {
  const sut = diffVersions(
    side(1, { gates: [{ gate: 'g(0,0)e', state: 'cross', circuit: 'a' }, { gate: 'g(0,0)ne', state: 'bar', circuit: 'a' }], circuits: [circuit('a', 'g(0,0)e'), circuit('b', 'g(0,0)ne')] }, { a: { lossDb: 1, fsrHz: 5 } }),
    side(2, { parkedState: 'cross', gates: [{ gate: 'g(0,0)e', state: 'split', kappa: 0.3, circuit: 'a' }, { gate: 'g(0,0)nw', state: 'bar', circuit: 'c' }], circuits: [circuit('a', 'g(0,0)nw'), circuit('c', 'g(0,0)nw')] }, { a: { lossDb: 1.5, fsrHz: 5 } }),
  );

  it('lists every gate whose setting was added, removed or changed, by id', () => {
    expect(sut.gatesChanged.map((g) => [g.gate, g.before?.state ?? null, g.after?.state ?? null])).toEqual([
      ['g(0,0)e', 'cross', 'split'],
      ['g(0,0)ne', 'bar', null],
      ['g(0,0)nw', null, 'bar'],
    ]);
  });

  it('names circuits added, removed and changed, and a changed parked state', () => {
    expect(sut).toMatchObject({ from: 1, to: 2, circuitsAdded: ['c'], circuitsRemoved: ['b'], circuitsChanged: ['a'], parkedStateChanged: true });
  });

  it('reports only the figures that changed', () => {
    expect(sut.figureChanges).toEqual([{ circuitId: 'a', figure: 'lossDb', before: 1, after: 1.5 }]);
  });

  it('finds nothing between a version and itself', () => {
    const same = side(3, { gates: [{ gate: 'g(0,0)e', state: 'bar' }] }, { x: { y: 1 } });
    expect(diffVersions(same, same)).toEqual({ from: 3, to: 3, gatesChanged: [], circuitsAdded: [], circuitsRemoved: [], circuitsChanged: [], parkedStateChanged: false, figureChanges: [] });
  });
});

describe('diffVersions of a circuit that did not change but whose shared gate did', () => {
  const ring: ConfigurationFile['circuits'][number] = { id: 'ring', kind: 'path', ports: [], paths: [{ role: 'bus', from: { gate: 'g(0,0)e', at: 'a0' }, to: { gate: 'g(0,0)e', at: 'a1' }, steps: [{ gate: 'g(0,0)ne', in: 'a0', out: 'a1' }] }], couplers: [] };
  const sut = diffVersions(
    side(1, { gates: [{ gate: 'g(0,0)ne', state: 'bar', phaseRad: 1.2, circuit: 'ring' }], circuits: [ring] }),
    side(2, { gates: [{ gate: 'g(0,0)ne', state: 'bar', circuit: 'delay' }], circuits: [ring, circuit('delay', 'g(0,0)ne')] }),
  );

  it('lists that circuit as changed: its light sees another setting', () => {
    expect(sut.circuitsAdded).toEqual(['delay']);
    expect(sut.circuitsChanged).toEqual(['ring']);
    expect(sut.gatesChanged.map((g) => g.gate)).toEqual(['g(0,0)ne']);
  });
});
