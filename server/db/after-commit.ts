import type { DataSource, EntityManager, EntitySubscriberInterface, QueryRunner } from 'typeorm';

/**
 * Work that must wait for the surrounding transaction to commit (live updates, e-mails): a rolled-back change
 * must never be announced. Savepoints count: work queued inside a rolled-back savepoint is dropped with it.
 */
interface Task {
  depth: number;
  run: () => void;
}
const pending = new WeakMap<QueryRunner, Task[]>();
const enabled = new WeakSet<DataSource>();

// TypeORM keeps the savepoint depth to itself; it tells which queued work a rolled-back savepoint takes with it.
const depthOf = (qr: QueryRunner) => (qr as unknown as { transactionDepth?: number }).transactionDepth ?? 1;

function settle(queryRunner: QueryRunner, committed: boolean): void {
  const tasks = pending.get(queryRunner) ?? [];
  if (queryRunner.isTransactionActive) {
    // A savepoint ended inside the transaction: a rollback drops what was queued within it; a release hands it to the parent.
    const depth = depthOf(queryRunner);
    pending.set(queryRunner, committed ? tasks.map((t) => ({ ...t, depth: Math.min(t.depth, depth) })) : tasks.filter((t) => t.depth <= depth));
    return;
  }
  pending.delete(queryRunner);
  if (!committed) return;
  for (const { run } of tasks) {
    try {
      run();
    } catch {
      // The data is committed; a socket or queue hiccup must not turn the request into an error.
    }
  }
}

const afterTransaction: EntitySubscriberInterface = {
  afterTransactionCommit: ({ queryRunner }) => settle(queryRunner, true),
  afterTransactionRollback: ({ queryRunner }) => settle(queryRunner, false),
};

/** Once per data source (createApp does it). */
export function enableAfterCommit(dataSource: DataSource): void {
  if (enabled.has(dataSource)) return;
  enabled.add(dataSource);
  dataSource.subscribers.push(afterTransaction);
}

/** Runs `task` once the manager's transaction commits (never if it rolls back); at once outside a transaction. */
export function afterCommit(manager: EntityManager, task: () => void): void {
  const qr = manager.queryRunner;
  if (!qr?.isTransactionActive) {
    try {
      task();
    } catch {
      // Same rule as after a commit: announcing is best effort.
    }
    return;
  }
  pending.set(qr, [...(pending.get(qr) ?? []), { depth: depthOf(qr), run: task }]);
}
