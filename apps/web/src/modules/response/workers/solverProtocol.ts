// Messages between the page and the solver worker: a request per redraw, an answer or an error per request.
import type { ConfigurationFile, FrequencyGridBody, SpectrumFile } from '@hexloom/contracts';
import type { PortPair } from '@hexloom/synth';

/** One redraw: the whole content, the port pairs to plot and the grid. `id` increases; only the newest matters. */
export type SolverRequest = { id: number; content: ConfigurationFile; pairs: PortPair[]; grid: FrequencyGridBody };

/** The answer to request `id`: one spectrum file per pair, in order, or the solver's message in words. */
export type SolverAnswer = { id: number; ok: true; spectra: SpectrumFile[]; elapsedMs: number } | { id: number; ok: false; error: string };
