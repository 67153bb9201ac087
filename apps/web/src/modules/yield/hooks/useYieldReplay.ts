// Replays a finished job's runs in small slices between frames, so the page stays responsive, then its gate sensitivities.
import type { ConfigurationFile, StartYieldJob } from '@hexloom/contracts';
import type { GateSensitivity } from '@hexloom/synth';
import { useEffect, useState } from 'react';
import { replayRuns, replaySensitivities, yieldReplayStudy } from '../utils/yieldReplay.js';

/** Runs computed per slice (one slice between two yields to the browser). */
const SLICE = 8;

/** Progress and result of a replay; `marginsDb` and `sensitivities` once it is complete. */
export type YieldReplay = {
  runsDone: number;
  runsTotal: number;
  passed: number;
  marginsDb: number[] | undefined;
  sensitivities: GateSensitivity[] | undefined;
  error: string | undefined;
};

/** Replays `request` on `content` while `enabled`; stops when unmounted or when the inputs change. */
export function useYieldReplay(content: ConfigurationFile, request: StartYieldJob | undefined, enabled: boolean): YieldReplay {
  const [state, setState] = useState<YieldReplay>({ runsDone: 0, runsTotal: request?.runs ?? 0, passed: 0, marginsDb: undefined, sensitivities: undefined, error: undefined });
  useEffect(() => {
    if (!enabled || !request) return;
    let stopped = false;
    let timer: ReturnType<typeof setTimeout> | undefined;
    const margins: number[] = [];
    let passed = 0;
    setState({ runsDone: 0, runsTotal: request.runs, passed: 0, marginsDb: undefined, sensitivities: undefined, error: undefined });
    const fail = (error: unknown) => setState((s) => ({ ...s, error: error instanceof Error ? error.message : String(error) }));
    try {
      const study = yieldReplayStudy(content, request);
      const step = () => {
        if (stopped) return;
        try {
          const count = Math.min(SLICE, study.runs - margins.length);
          for (const run of replayRuns(study, margins.length, count)) {
            margins.push(run.marginDb);
            if (run.pass) passed++;
          }
          if (margins.length < study.runs) {
            setState((s) => ({ ...s, runsDone: margins.length, passed }));
            timer = setTimeout(step, 0);
            return;
          }
          const sensitivities = replaySensitivities(study);
          setState({ runsDone: margins.length, runsTotal: study.runs, passed, marginsDb: [...margins], sensitivities, error: undefined });
        } catch (error) {
          fail(error);
        }
      };
      timer = setTimeout(step, 0);
    } catch (error) {
      fail(error);
    }
    return () => {
      stopped = true;
      if (timer) clearTimeout(timer);
    };
  }, [content, request, enabled]);
  return state;
}
