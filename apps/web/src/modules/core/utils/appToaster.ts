// The app's one toaster (Blueprint OverlayToaster), created on first use.
import { OverlayToaster, type Toaster } from '@blueprintjs/core';

let toaster: Promise<Toaster> | undefined;

/** Shows a danger toast with the message and, when given, a Retry action. */
export function showErrorToast(message: string, retry?: () => void): void {
  toaster ??= OverlayToaster.create({ position: 'top', maxToasts: 3 });
  void toaster.then((t) => t.show({ intent: 'danger', icon: 'error', message, timeout: 10_000, ...(retry ? { action: { text: 'Retry', onClick: retry } } : {}) }));
}
