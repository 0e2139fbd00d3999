/**
 * IPC channel names between preload and main. One channel per StaysetHost method
 * (`stayset:<method>`, invoke/handle) and one per event (`stayset:event:<name>`, main → page).
 * Only preload.ts and ipc-handlers.ts use these.
 */
import type { HostMethodName, WebEventName } from '../common/web-protocol.ts';

export const CHANNEL_PREFIX = 'stayset:';

export function methodChannel(method: HostMethodName): string {
  return `${CHANNEL_PREFIX}${method}`;
}

export function eventChannel(event: WebEventName): string {
  return `${CHANNEL_PREFIX}event:${event}`;
}
