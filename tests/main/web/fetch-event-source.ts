/**
 * A minimal EventSource for Node tests (Node 20 has none): reads the text/event-stream of
 * GET url with fetch and dispatches `event:` / `data:` blocks as MessageEvent-like objects.
 * Follows the W3C Server-Sent Events format: blocks separated by a blank line, `:` comments.
 */
import type { EventSourceLike } from '../../../main/common/web-host-client.ts';

export function fetchEventSource(url: string): EventSourceLike & { opened: Promise<void> } {
  const controller = new AbortController();
  const listeners = new Map<string, ((e: MessageEvent) => void)[]>();
  let markOpen: () => void = () => undefined;
  const opened = new Promise<void>((r) => (markOpen = r));
  void (async () => {
    const res = await fetch(url, { signal: controller.signal });
    if (!res.ok || !res.body) throw new Error(`event stream refused: ${res.status}`);
    markOpen();
    const decoder = new TextDecoder();
    let buffer = '';
    for await (const chunk of res.body) {
      buffer += decoder.decode(chunk as Uint8Array, { stream: true });
      let cut: number;
      while ((cut = buffer.indexOf('\n\n')) >= 0) {
        const block = buffer.slice(0, cut);
        buffer = buffer.slice(cut + 2);
        let event = 'message';
        const data: string[] = [];
        for (const line of block.split('\n')) {
          if (line.startsWith('event: ')) event = line.slice(7);
          else if (line.startsWith('data: ')) data.push(line.slice(6));
        }
        if (data.length === 0) continue;
        for (const l of listeners.get(event) ?? []) l({ data: data.join('\n') } as MessageEvent);
      }
    }
  })().catch(() => undefined);
  return {
    opened,
    addEventListener(type, listener) {
      listeners.set(type, [...(listeners.get(type) ?? []), listener]);
    },
    close() {
      controller.abort();
    },
  };
}
