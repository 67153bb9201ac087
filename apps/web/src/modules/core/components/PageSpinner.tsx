// Centred spinner for a page whose data is loading.
import { Spinner } from '@blueprintjs/core';

/** A large spinner with an accessible label. */
export function PageSpinner({ label = 'Loading' }: { label?: string }) {
  return (
    <div style={{ display: 'flex', justifyContent: 'center', padding: 64 }} aria-label={label} role="status">
      <Spinner size={40} />
    </div>
  );
}
