/** Plain types of a mask and of a sampled response, as the synthesiser checks them. */

export type FrequencyRange = { fromHz: number; toHz: number };

/** A mask region (same shape as the specification file format's mask). */
export type MaskRegion = (
  | { kind: 'pass'; range: FrequencyRange; maxInsertionLossDb?: number | undefined; maxRippleDb?: number | undefined }
  | { kind: 'stop'; range: FrequencyRange; minRejectionDb: number }
  | { kind: 'delay'; range: FrequencyRange; maxDelayRipplePs?: number | undefined; delayPs?: number | undefined; delayTolerancePs?: number | undefined }
) & {
  /** Output (port id or label) the region applies to; absent: the circuit's main output(s). */
  port?: string | undefined;
};

/** A response sampled on a frequency grid (offsets from the carrier), power in dB, group delay in ps. */
export type SampledResponse = {
  frequencyHz: readonly number[];
  powerDb: readonly number[];
  groupDelayPs: readonly number[];
};
