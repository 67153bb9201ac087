// Schema version, approval and SHA-256 checksum of a bench export, with the browser's own check of it.
import { Spinner, Tag } from '@blueprintjs/core';
import type { BenchExportBody } from '@hexloom/contracts';
import type { ChecksumCheck } from '../hooks/useChecksumCheck.js';

export type ChecksumLineProps = { exported: BenchExportBody; check: ChecksumCheck };

/** The tag says "Checksum verified" only once Web Crypto has recomputed the hash and it matched. */
function CheckTag({ check }: { check: ChecksumCheck }) {
  if (check.state === 'verified') return <Tag intent="success" icon="tick-circle">Checksum verified</Tag>;
  if (check.state === 'mismatch') return <Tag intent="danger" icon="error">Checksum does not match the data: do not use this export</Tag>;
  if (check.state === 'failed') return <Tag intent="warning" icon="warning-sign">{`Checksum not checked: ${check.message ?? 'this browser cannot hash'}`}</Tag>;
  return (
    <span className="hx-bench-inline">
      <Spinner size={14} aria-label="Checking the checksum" /> Checking the checksum…
    </span>
  );
}

/** A definition list: format, approval and checksum. */
export function ChecksumLine({ exported, check }: ChecksumLineProps) {
  return (
    <dl className="hx-bench-facts">
      <dt>Format</dt>
      <dd>Hexloom bench export, schema version {exported.schemaVersion}</dd>
      <dt>Approval</dt>
      <dd>{exported.approved ? <Tag intent="success">Approved</Tag> : <Tag intent="warning">Not approved: review before use on the bench</Tag>}</dd>
      <dt>Checksum</dt>
      <dd>
        <span className="hx-bench-inline">SHA-256 of the RFC 8785 canonical JSON of every other field</span>
        <code className="hx-mono hx-bench-checksum">{exported.checksum}</code>
        <CheckTag check={check} />
      </dd>
    </dl>
  );
}
