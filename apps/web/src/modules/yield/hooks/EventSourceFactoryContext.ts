// How the yield panel opens server-sent event streams; tests provide a fake.
import { createContext } from 'react';

/** The part of EventSource the panel uses (a fake in tests implements just this). */
export type EventSourceLike = {
  addEventListener(type: string, listener: (event: MessageEvent<string>) => void): void;
  onerror: ((event: Event) => void) | null;
  close(): void;
};

/** Opens a stream at a same-origin URL. */
export type EventSourceFactory = (url: string) => EventSourceLike;

/** The browser's EventSource; same-origin, so the session cookie goes with it (no `withCredentials` needed). */
export const browserEventSource: EventSourceFactory = (url) => new EventSource(url, { withCredentials: false }) as unknown as EventSourceLike;

/** Provides the factory; the default is the browser's EventSource. */
export const EventSourceFactoryContext = createContext<EventSourceFactory>(browserEventSource);
