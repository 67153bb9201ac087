// Public door of the activity module: the team's recent activity (audit log) in words.
export { RecentActivity, type RecentActivityProps } from './components/RecentActivity.js';
