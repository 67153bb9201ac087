// The shape of the workspace while its data loads: header, canvas, side panel and plot as skeleton blocks.
import { Classes } from '@blueprintjs/core';
import '../workspace.css';

/** Blueprint's skeleton class on placeholder blocks the size of what will come. */
export function WorkspaceSkeleton() {
  return (
    <div className="hx-stack hx-workspace-root" aria-busy="true" aria-label="Loading the configuration" data-testid="workspace-skeleton">
      <h1 className={Classes.SKELETON} style={{ width: 320 }}>
        Loading
      </h1>
      <div className="hx-workspace">
        <div className={Classes.SKELETON} style={{ height: 460 }} />
        <div className={Classes.SKELETON} style={{ height: 460 }} />
      </div>
      <div className={Classes.SKELETON} style={{ height: 320 }} />
    </div>
  );
}
