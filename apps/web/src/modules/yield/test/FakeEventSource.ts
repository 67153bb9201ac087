// A stand-in for the browser's EventSource: records the URL and lets a test push `progress` events or fail the stream.
import type { EventSourceFactory, EventSourceLike } from '../hooks/EventSourceFactoryContext.js';

/** One fake stream; `emit` sends a `progress` event whose data is `job` as JSON. */
export class FakeEventSource implements EventSourceLike {
  onerror: ((event: Event) => void) | null = null;
  closed = false;
  private readonly listeners = new Map<string, ((event: MessageEvent<string>) => void)[]>();
  constructor(readonly url: string) {}
  addEventListener(type: string, listener: (event: MessageEvent<string>) => void): void {
    this.listeners.set(type, [...(this.listeners.get(type) ?? []), listener]);
  }
  close(): void {
    this.closed = true;
  }
  emit(job: unknown): void {
    for (const l of this.listeners.get('progress') ?? []) l(new MessageEvent('progress', { data: JSON.stringify(job) }));
  }
  fail(): void {
    this.onerror?.(new Event('error'));
  }
}

/** A factory that keeps every stream it opened, newest last. */
export function fakeEventSources(): { factory: EventSourceFactory; opened: FakeEventSource[] } {
  const opened: FakeEventSource[] = [];
  return {
    opened,
    factory: (url) => {
      const source = new FakeEventSource(url);
      opened.push(source);
      return source;
    },
  };
}
