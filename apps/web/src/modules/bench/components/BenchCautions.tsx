// The cautions of a bench export, shown before any download, with the checkbox that acknowledges them.
import { Callout, Checkbox } from '@blueprintjs/core';

export type BenchCautionsProps = {
  /** The cautions' text (from the export, the server's refusal, or libs/bench). */
  cautions: readonly string[];
  acknowledged: boolean;
  onAcknowledgedChange: (acknowledged: boolean) => void;
};

/** A warning callout listing each caution; the downloads stay disabled until the box is ticked. */
export function BenchCautions({ cautions, acknowledged, onAcknowledgedChange }: BenchCautionsProps) {
  return (
    <Callout intent="warning" icon="warning-sign" title="Before these values go to the bench" className="hx-bench-cautions">
      <ul className="hx-bench-caution-list">
        {cautions.map((c) => (
          <li key={c}>{c}</li>
        ))}
      </ul>
      <Checkbox
        className="hx-bench-ack"
        checked={acknowledged}
        onChange={(e) => onAcknowledgedChange(e.currentTarget.checked)}
        label="I have read these cautions; I will check the values against the chip's ratings and follow our lab's safety rules."
      />
    </Callout>
  );
}
