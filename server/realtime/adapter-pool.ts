import type { Pool, PoolClient } from 'pg';

/** What @socket.io/postgres-adapter uses of a pool: `connect` for its LISTEN client, `query` for everything else. */
export type AdapterPool = Pick<Pool, 'connect' | 'query'>;

/**
 * The adapter keeps one client for LISTEN and, when its connection drops (PostgreSQL restarted), forgets it without
 * releasing it: the pool counts it as checked out for ever, so after `max` outages the adapter can never reconnect
 * and `pool.end()` never returns. Release a held client with an error (which discards it) when its connection ends.
 */
export function releaseDroppedListenClients(pool: Pool): AdapterPool {
  return {
    query: pool.query.bind(pool) as Pool['query'],
    connect: (async () => {
      const client: PoolClient = await pool.connect();
      const releaseToPool = client.release;
      let released = false;
      const onEnd = () => release(new Error('the LISTEN connection ended'));
      const release = (err?: Error | boolean) => {
        if (released) return;
        released = true;
        client.off('end', onEnd);
        releaseToPool.call(client, err);
      };
      client.release = release;
      client.once('end', onEnd);
      return client;
    }) as Pool['connect'],
  };
}
