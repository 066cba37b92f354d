import { useEffect, useRef, useSyncExternalStore } from 'react';
import { io, type Socket } from 'socket.io-client';
import type { ClientToServerEvents, ServerToClientEvents } from '@shared/events/socket-events';

export type AppSocket = Socket<ServerToClientEvents, ClientToServerEvents>;
type EventName = keyof ServerToClientEvents;

/** One connection per signed-in person, shared by every component; it carries the session cookie, nothing else. */
let current: { userId: string; socket: AppSocket } | null = null;
const subscribers = new Set<() => void>();
const changed = () => subscribers.forEach((s) => s());
const subscribe = (s: () => void) => {
  subscribers.add(s);
  return () => subscribers.delete(s);
};
const snapshot = () => current?.socket ?? null;

export function openSocket(userId: string): AppSocket {
  if (current?.userId === userId) return current.socket;
  closeSocket();
  // WebSocket only: no long-polling session that would need sticky routing between server instances.
  const socket: AppSocket = io({ transports: ['websocket'], withCredentials: true });
  current = { userId, socket };
  changed();
  return socket;
}

export function closeSocket(): void {
  if (!current) return;
  current.socket.close();
  current = null;
  changed();
}

/** Keeps the connection open while `userId` is signed in; closes it on sign-out or when someone else signs in. */
export function useLiveSocket(userId: string): void {
  useEffect(() => {
    openSocket(userId);
    return () => closeSocket();
  }, [userId]);
}

function useCurrentSocket(): AppSocket | null {
  return useSyncExternalStore(subscribe, snapshot, () => null);
}

/** The handler of the latest render (in a ref, the same object every render), so a listener stays subscribed while the handler it calls is kept current. */
function useLatest<T>(handler: T) {
  const latest = useRef(handler);
  useEffect(() => {
    latest.current = handler;
  });
  return latest;
}

/** Calls `handler` for each `name` event; the latest handler is used without re-subscribing. */
export function useSocketEvent<E extends EventName>(name: E, handler: ServerToClientEvents[E]): void {
  const socket = useCurrentSocket();
  const latest = useLatest(handler);
  useEffect(() => {
    if (!socket) return;
    const listener = ((...args: Parameters<ServerToClientEvents[E]>) =>
      (latest.current as (...a: typeof args) => void)(...args)) as never;
    socket.on(name, listener);
    return () => {
      socket.off(name, listener);
    };
  }, [socket, name, latest]);
}

/** Calls `handler` after the connection comes back (e.g. a server restart), so missed events can be refetched. */
export function useSocketReconnect(handler: () => void): void {
  const socket = useCurrentSocket();
  const latest = useLatest(handler);
  useEffect(() => {
    if (!socket) return;
    const listener = () => latest.current();
    socket.io.on('reconnect', listener);
    return () => {
      socket.io.off('reconnect', listener);
    };
  }, [socket, latest]);
}
