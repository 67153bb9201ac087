// The mask a yield study checks: the circuit's saved spec's mask, restricted to the chosen output.
import type { ConfigurationVersion, Mask } from '@hexloom/contracts';

/**
 * The regions of the spec saved for `circuitId` that apply to output `toPort` (regions naming no port apply to every
 * output; a region naming the port by id or by label applies to it). No spec or no regions: an empty mask.
 */
export function circuitMask(version: ConfigurationVersion, circuitId: string | undefined, toPort: { id: string; label: string } | undefined): Mask {
  const spec = version.specs.find((s) => s.circuitId === circuitId)?.spec;
  if (!spec || !toPort) return { regions: [] };
  return { regions: spec.mask.regions.filter((r) => r.port === undefined || r.port === toPort.id || r.port === toPort.label) };
}
