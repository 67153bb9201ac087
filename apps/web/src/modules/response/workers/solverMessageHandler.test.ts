// solverMessageHandler: while one request waits, newer ones replace it; only the newest is computed and answered.
import { describe, expect, it } from 'vitest';
import { ringNotchContent } from '../testing/ringNotchContent.js';
import { solverMessageHandler } from './solverMessageHandler.js';
import type { SolverAnswer, SolverRequest } from './solverProtocol.js';

const content = ringNotchContent();
const request = (id: number, to = 'out'): SolverRequest => ({ id, content, pairs: [{ from: 'in', to }], grid: { kind: 'fsr', points: 64 } });

describe('solverMessageHandler', () => {
  it('computes only the newest of the requests queued before it runs', () => {
    const answers: SolverAnswer[] = [];
    const computed: number[] = [];
    const queue: (() => void)[] = [];
    const sut = solverMessageHandler((a) => answers.push(a), (run) => queue.push(run), (r) => (computed.push(r.pairs.length), []));
    sut(request(1));
    sut(request(3));
    sut(request(2));
    expect(queue.length).toBe(1);
    queue.shift()?.();
    expect(answers.map((a) => a.id)).toEqual([3]);
    expect(computed).toEqual([1]);
  });

  it('answers the solver error in words for a port the chip does not have', () => {
    const answers: SolverAnswer[] = [];
    const sut = solverMessageHandler((a) => answers.push(a), (run) => run());
    sut(request(7, 'nowhere'));
    expect(answers).toEqual([{ id: 7, ok: false, error: expect.stringMatching(/"nowhere".*not a port id or label/) }]);
  });
});
