// The form a kind starts with: its default spec, its ports matched to the chip's free ones, a free circuit id.
import type { FilterSpecKind } from '@hexloom/contracts';
import type { SynthesisFormState } from './buildSynthesiseBody.js';
import { DEFAULT_SPECS } from './defaultSpecs.js';
import { maskToMaskRows } from './maskToMaskRows.js';
import { portResolver, type ChipPort } from './portResolver.js';
import { specToFormValues } from './specToFormValues.js';
import { suggestCircuitId } from './suggestCircuitId.js';

/** Starting state for `kind`: example ports kept when free on this chip, otherwise the next free ones. */
export function initialFormState(kind: FilterSpecKind, ports: readonly ChipPort[], existingCircuitIds: readonly string[]): SynthesisFormState {
  const spec = DEFAULT_SPECS[kind];
  const free = ports.filter((p) => p.free);
  const maskPort = (ref: string) => {
    const port = free.find((p) => p.label === ref || p.id === ref);
    return port ? port.label || port.id : '';
  };
  return {
    circuitId: suggestCircuitId(kind, existingCircuitIds),
    name: spec.name,
    values: specToFormValues(spec.spec, portResolver(ports)),
    mask: maskToMaskRows(spec.mask, maskPort),
  };
}
