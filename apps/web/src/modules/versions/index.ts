// Public door of the versions module: the Versions tab panel and the team home's review list.
export { VersionsPanel, type VersionsPanelProps } from './components/VersionsPanel.js';
export { WaitingForMyReview, type WaitingForMyReviewProps } from './components/WaitingForMyReview.js';
export { configurationVersionPath } from './utils/configurationVersionPath.js';
