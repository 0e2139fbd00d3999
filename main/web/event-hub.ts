/**
 * Server-Sent Events fan-out for `GET /api/events`. Each event is
 * `event: <name>\ndata: <JSON>\n\n`; a comment line every `heartbeatMs` keeps proxies and
 * idle timers from closing the stream.
 */
import type { ServerResponse } from 'node:http';
import type { WebEventName } from '../common/web-protocol.ts';

export function formatSseEvent(event: WebEventName, data: unknown): string {
  return `event: ${event}\ndata: ${JSON.stringify(data)}\n\n`;
}

export class EventHub {
  private readonly clients = new Set<ServerResponse>();
  private readonly heartbeat: ReturnType<typeof setInterval>;

  constructor(heartbeatMs = 15_000) {
    this.heartbeat = setInterval(() => this.write(': keep-alive\n\n'), heartbeatMs);
    this.heartbeat.unref();
  }

  get size(): number {
    return this.clients.size;
  }

  add(res: ServerResponse, csp: string): void {
    res.writeHead(200, {
      'Content-Type': 'text/event-stream; charset=utf-8',
      'Cache-Control': 'no-store',
      Connection: 'keep-alive',
      'Content-Security-Policy': csp,
      'X-Content-Type-Options': 'nosniff',
    });
    res.write(': connected\n\n');
    this.clients.add(res);
    res.on('close', () => this.clients.delete(res));
  }

  broadcast(event: WebEventName, data: unknown): void {
    this.write(formatSseEvent(event, data));
  }

  private write(chunk: string): void {
    for (const c of this.clients) c.write(chunk);
  }

  close(): void {
    clearInterval(this.heartbeat);
    for (const c of this.clients) c.end();
    this.clients.clear();
  }
}
