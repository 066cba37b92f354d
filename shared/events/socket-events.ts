/** Socket event names and payloads, shared by the server and the browser. Sockets notify; queries stay the store. */
export interface ServerToClientEvents {
  /** Something the viewer may see changed; the client refetches the named query groups. */
  changed: (payload: { scope: string; clubId?: string; id?: string }) => void;
}

// The browser sends nothing over the socket yet: every change goes through the HTTP API.
export type ClientToServerEvents = Record<string, never>;

export const rooms = {
  user: (userId: string) => `user:${userId}`,
  club: (clubId: string) => `club:${clubId}`,
};
