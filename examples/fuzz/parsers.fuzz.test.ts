// Property-based fuzzing of every file parser: whatever the text, a parser answers data or its own typed error that
// names the line or field, never a crash of another kind (fast-check, seeded so failures reproduce).
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { configurationSchema, filterSpecSchema, meshDefinitionSchema } from '@hexloom/contracts';
import { parseCalibrationCsv } from '@hexloom/bench';
import { buildMesh, checkConfiguration, type Configuration } from '@hexloom/mesh';
import { readSpectrumCsv, readTouchstone } from '@hexloom/solver';
import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';

const RUNS = 1000;
const here = fileURLToPath(new URL('../', import.meta.url));
const demoMesh = JSON.parse(readFileSync(`${here}mesh/demo-mesh.json`, 'utf8')) as Record<string, unknown>;
const ringConfiguration = JSON.parse(readFileSync(`${here}solver/ring-notch.configuration.json`, 'utf8')) as Record<string, unknown>;
const calibration = 'gate,shifter,offset_rad,p_pi_mw,resistance_ohm,max_power_mw,max_voltage_v\n"g(0,0)e",theta,0.12,22,1200,60,9\n';
const touchstone = '! demo\n# GHZ S RI R 50\n1 0.1 0 0.9 0 0.9 0 0.1 0\n2 0.2 0 0.8 0 0.8 0 0.2 0\n';
const spectrumCsv = 'frequency_hz,amplitude_db\n193400000000000,-3\n193400001000000,-3.5\n';

/** Text near a valid file: the file with characters inserted, deleted or replaced, or any text at all. */
const mutated = (valid: string) =>
  fc.oneof(
    fc.string({ unit: 'binary', maxLength: 400 }),
    fc.tuple(fc.nat({ max: valid.length }), fc.nat({ max: 20 }), fc.string({ unit: 'binary', maxLength: 30 })).map(([at, cut, insert]) => valid.slice(0, at) + insert + valid.slice(at + cut)),
  );

/** Runs `parse`; the only errors allowed are those named in `allowed`, and their message is not empty. */
function onlyTypedErrors(parse: () => unknown, allowed: readonly string[]): void {
  try {
    parse();
  } catch (error) {
    expect(error).toBeInstanceOf(Error);
    expect(allowed, `${(error as Error).name}: ${(error as Error).message}`).toContain((error as Error).name);
    expect((error as Error).message.length).toBeGreaterThan(10);
  }
}

/** A JSON document near `valid`: one member replaced by an arbitrary JSON value, or removed. */
const jsonNear = (valid: Record<string, unknown>) =>
  fc.tuple(fc.constantFrom(...Object.keys(valid)), fc.option(fc.jsonValue({ maxDepth: 3 }), { nil: undefined })).map(([key, value]) => {
    const copy: Record<string, unknown> = structuredClone(valid);
    if (value === undefined) delete copy[key];
    else copy[key] = value;
    return copy;
  });

describe('every parser, fuzzed', () => {
  it('reads calibration CSV or names the bad line (CalibrationCsvError)', () => {
    fc.assert(fc.property(mutated(calibration), (text) => onlyTypedErrors(() => parseCalibrationCsv(text), ['CalibrationCsvError', 'BenchInputError'])), { numRuns: RUNS, seed: 1 });
  });
  it('reads Touchstone or names the bad line (SpectrumFileError)', () => {
    fc.assert(fc.property(mutated(touchstone), (text) => onlyTypedErrors(() => readTouchstone(text, { fileName: 'fuzz.s2p' }), ['SpectrumFileError'])), { numRuns: RUNS, seed: 2 });
  });
  it('reads a measured spectrum CSV or names the bad line (SpectrumFileError)', () => {
    fc.assert(fc.property(mutated(spectrumCsv), (text) => onlyTypedErrors(() => readSpectrumCsv(text), ['SpectrumFileError'])), { numRuns: RUNS, seed: 3 });
  });
  it('takes a chip JSON near the demo mesh only through its schema, and builds it or names why not (MeshError)', () => {
    fc.assert(
      fc.property(jsonNear(demoMesh), (doc) => {
        const parsed = meshDefinitionSchema.safeParse(doc);
        if (parsed.success) onlyTypedErrors(() => buildMesh(parsed.data), ['MeshError']);
      }),
      { numRuns: RUNS, seed: 4 },
    );
  });
  it('checks a configuration JSON near the example ring without throwing: every problem is a violation', () => {
    fc.assert(
      fc.property(jsonNear(ringConfiguration), (doc) => {
        const parsed = configurationSchema.safeParse(doc);
        if (!parsed.success) return;
        let mesh;
        try {
          mesh = buildMesh(parsed.data.mesh);
        } catch (error) {
          expect((error as Error).name).toBe('MeshError');
          return;
        }
        expect(() => checkConfiguration(mesh, parsed.data as Configuration)).not.toThrow();
      }),
      { numRuns: RUNS, seed: 5 },
    );
  });
  it('takes a specification only through its schema: arbitrary JSON is refused with its paths', () => {
    fc.assert(
      fc.property(fc.jsonValue({ maxDepth: 4 }), (doc) => {
        const r = filterSpecSchema.safeParse(doc);
        if (!r.success) expect(r.error.issues.length).toBeGreaterThan(0);
      }),
      { numRuns: RUNS, seed: 6 },
    );
  });
});
