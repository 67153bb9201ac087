// One gate's setting in a version, in words ("split, 30 % cross-coupling, phase 1.571 rad, circuit notch").
import type { GateChange } from '@hexloom/contracts';
import { formatNumber } from '../../figures/utils/formatFigure.js';

/** `null` means the version leaves the gate unset, so it sits in the configuration's parked state. */
export function describeGateSetting(setting: GateChange['before'], parkedState: 'bar' | 'cross'): string {
  if (!setting) return `parked (${parkedState})`;
  const parts: string[] = [setting.state];
  if (setting.state === 'split') parts.push(`${formatNumber((setting.kappa ?? 0.5) * 100, 3)} % cross-coupling`);
  if (setting.phaseRad !== undefined) parts.push(`phase ${formatNumber(setting.phaseRad)} rad`);
  if (setting.circuit) parts.push(`circuit ${setting.circuit}`);
  return parts.join(', ');
}
