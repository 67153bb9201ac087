// What a comment points at: a gate (a button that shows it on the canvas) or a frequency band.
import { Button, Tag } from '@blueprintjs/core';
import type { CommentAnchor } from '@hexloom/contracts';
import { formatFrequencyHz } from '../../figures/utils/formatFigure.js';

export type CommentAnchorLabelProps = { anchor: CommentAnchor | null; onPinGate: ((gateId: string | undefined) => void) | undefined };

/** "Gate g(2,1)ne" (click: select it on the canvas) or "Band 1.9 GHz to 2.1 GHz from the reference". */
export function CommentAnchorLabel({ anchor, onPinGate }: CommentAnchorLabelProps) {
  if (!anchor) return null;
  if ('gate' in anchor) {
    const text = `Gate ${anchor.gate}`;
    return onPinGate ? (
      <Button size="small" variant="minimal" icon="map-marker" text={text} aria-label={`Show gate ${anchor.gate} on the mesh`} onClick={() => onPinGate(anchor.gate)} />
    ) : (
      <Tag minimal icon="map-marker">
        {text}
      </Tag>
    );
  }
  return (
    <Tag minimal icon="timeline-area-chart">
      Band {formatFrequencyHz(anchor.fromHz)} to {formatFrequencyHz(anchor.toHz)} from the reference
    </Tag>
  );
}
