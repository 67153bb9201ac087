// The yield module's public door: the workspace's Yield tab and the injectable event stream.
export { YieldPanel, type YieldPanelProps } from './components/YieldPanel.js';
export { EventSourceFactoryContext, type EventSourceFactory, type EventSourceLike } from './hooks/EventSourceFactoryContext.js';
