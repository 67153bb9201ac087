// Unsaved edits are not lost by a click elsewhere in the app, a reload or closing the tab.
import { useEffect } from 'react';
import { useBlocker, type Blocker } from 'react-router-dom';

/** While `dirty`, blocks in-app navigation (the caller shows a confirmation from the blocker) and asks before unload. */
export function useUnsavedChangesGuard(dirty: boolean): Blocker {
  const blocker = useBlocker(({ currentLocation, nextLocation }) => dirty && currentLocation.pathname !== nextLocation.pathname);
  useEffect(() => {
    if (!dirty) return undefined;
    const onBeforeUnload = (event: BeforeUnloadEvent): void => {
      event.preventDefault();
    };
    window.addEventListener('beforeunload', onBeforeUnload);
    return () => window.removeEventListener('beforeunload', onBeforeUnload);
  }, [dirty]);
  return blocker;
}
