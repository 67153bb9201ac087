// The review status of a configuration version as a coloured tag.
import { Tag, type Intent } from '@blueprintjs/core';
import type { VersionStatus } from '@hexloom/contracts';

const LOOK: Record<VersionStatus, { intent: Intent; label: string }> = {
  draft: { intent: 'none', label: 'draft' },
  in_review: { intent: 'primary', label: 'in review' },
  approved: { intent: 'success', label: 'approved' },
  changes_requested: { intent: 'warning', label: 'changes requested' },
};

/** A minimal tag: grey draft, blue in review, green approved, amber changes requested. */
export function StatusTag({ status }: { status: VersionStatus }) {
  const look = LOOK[status];
  return (
    <Tag minimal round intent={look.intent} data-testid="status-tag">
      {look.label}
    </Tag>
  );
}
