// Calibration CSV: every row checked, line-numbered reasons, nothing returned when any row is bad.
import { describe, expect, it } from 'vitest';
import { CALIBRATION_COLUMN_RANGES, CALIBRATION_COLUMNS, CalibrationCsvError, parseCalibrationCsv, writeCalibrationCsv } from '../src/index.js';
import { CALIBRATION_CSV_COLUMNS, CALIBRATION_RANGES } from '../../contracts/src/team-server/calibration.js';

const HEADER = 'gate,shifter,offset_rad,p_pi_mw,resistance_ohm,max_power_mw,max_voltage_v';
const good = [
  '# invented calibration of two shifters',
  HEADER,
  '"g(0,0)e",theta,0.12,22,1200,80,12',
  '"g(0,0)e",phi,-0.3,21.5,1180,80,12',
].join('\n');

const issuesOf = (text: string): { line: number; column: string | null }[] => {
  try {
    parseCalibrationCsv(text);
  } catch (error) {
    expect(error).toBeInstanceOf(CalibrationCsvError);
    return (error as CalibrationCsvError).issues.map((i) => ({ line: i.line, column: i.column }));
  }
  throw new Error('expected a CalibrationCsvError');
};

describe('parseCalibrationCsv', () => {
  it('reads each row in SI units (mW become W)', () => {
    const sut = parseCalibrationCsv(good);
    expect(sut).toHaveLength(2);
    expect(sut[0]).toEqual({ gate: 'g(0,0)e', shifter: 'theta', offsetRad: 0.12, piPowerW: 0.022, resistanceOhm: 1200, maxPowerW: 0.08, maxVoltageV: 12 });
    expect(sut[1]?.piPowerW).toBeCloseTo(0.0215, 15);
  });

  it('accepts the columns in another order and header names in capitals', () => {
    const sut = parseCalibrationCsv('SHIFTER,gate,offset_rad,p_pi_mw,resistance_ohm,max_power_mw,max_voltage_v\nphi,"g(1,0)ne",0,20,1000,50,10\n');
    expect(sut[0]).toMatchObject({ gate: 'g(1,0)ne', shifter: 'phi', piPowerW: 0.02 });
  });

  it('names a missing column on the header line', () => {
    expect(() => parseCalibrationCsv('gate,shifter,offset_rad,p_pi_mw\n"g(0,0)e",theta,0,22\n')).toThrow(/line 1: the header lacks column\(s\) resistance_ohm, max_power_mw, max_voltage_v/);
  });

  it('reports a NaN, an out-of-range value and a bad gate id with their lines and columns', () => {
    const text = [HEADER, '"g(0,0)e",theta,NaN,22,1200,80,12', '"g(0,0)e",phi,0,5000,1200,80,12', 'gate7,theta,0,22,1200,80,12'].join('\n');
    expect(issuesOf(text)).toEqual([
      { line: 2, column: 'offset_rad' },
      { line: 3, column: 'p_pi_mw' },
      { line: 4, column: 'gate' },
    ]);
  });

  it('refuses a duplicate shifter, naming the earlier line', () => {
    expect(() => parseCalibrationCsv(`${HEADER}\n"g(0,0)e",theta,0,22,1200,80,12\n"g(0,0)e",theta,0,23,1200,80,12\n`)).toThrow(/line 3: shifter g\(0,0\)e:theta is already given on line 2/);
  });

  it('refuses a short row and a gate the chip does not have', () => {
    const text = `${HEADER}\n"g(0,0)e",theta,0,22\n"g(5,5)e",theta,0,22,1200,80,12\n`;
    expect(() => parseCalibrationCsv(text, { knownGates: new Set(['g(0,0)e']) })).toThrow(/line 2: expected 7 cells, got 4; line 3 \(gate\): gate g\(5,5\)e is not a gate of this chip/);
  });

  it('refuses a file with a header and no rows, or nothing at all', () => {
    expect(() => parseCalibrationCsv(`${HEADER}\n`)).toThrow(/no data rows/);
    expect(() => parseCalibrationCsv('')).toThrow(/no header line/);
  });

  it('reads back what writeCalibrationCsv wrote', () => {
    const shifters = parseCalibrationCsv(good);
    expect(parseCalibrationCsv(writeCalibrationCsv(shifters, ['round trip']))).toEqual(shifters);
  });

  it('uses the same columns and ranges as the contracts schema (SI units there)', () => {
    expect([...CALIBRATION_COLUMNS]).toEqual([...CALIBRATION_CSV_COLUMNS]);
    expect(CALIBRATION_COLUMN_RANGES.p_pi_mw.max / 1000).toBe(CALIBRATION_RANGES.piPowerW.max);
    expect(CALIBRATION_COLUMN_RANGES.p_pi_mw.min / 1000).toBe(CALIBRATION_RANGES.piPowerW.min);
    expect(CALIBRATION_COLUMN_RANGES.max_power_mw.max / 1000).toBe(CALIBRATION_RANGES.maxPowerW.max);
    expect(CALIBRATION_COLUMN_RANGES.resistance_ohm).toEqual(CALIBRATION_RANGES.resistanceOhm);
    expect(CALIBRATION_COLUMN_RANGES.max_voltage_v).toEqual(CALIBRATION_RANGES.maxVoltageV);
  });
});
