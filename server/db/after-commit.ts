import type { DataSource, EntityManager, EntitySubscriberInterface, QueryRunner } from 'typeorm';

/**
 * Work that must wait for the surrounding transaction to commit (live updates, e-mails): a rolled-back change
 * must never be announced. Savepoints count: work queued inside a rolled-back savepoint is dropped with it.
 */
interface Task {
  depth: number;
  run: () => void;
}
/** The queue rides on the query runner's own scratch space (`data`, which TypeORM keeps for subscribers). */
const KEY = 'shoalwise.afterCommit';
const queued = (qr: QueryRunner): Task[] => (qr.data as Record<string, Task[] | undefined>)[KEY] ?? [];
const setQueued = (qr: QueryRunner, tasks: Task[] | undefined) => {
  (qr.data as Record<string, Task[] | undefined>)[KEY] = tasks;
};

// TypeORM keeps the savepoint depth to itself; it tells which queued work a rolled-back savepoint takes with it.
const depthOf = (qr: QueryRunner) => (qr as unknown as { transactionDepth?: number }).transactionDepth ?? 1;

function settle(queryRunner: QueryRunner, committed: boolean): void {
  const tasks = queued(queryRunner);
  if (queryRunner.isTransactionActive) {
    // A savepoint ended inside the transaction: a rollback drops what was queued within it; a release hands it to the parent.
    const depth = depthOf(queryRunner);
    setQueued(
      queryRunner,
      committed
        ? tasks.map((t) => ({ ...t, depth: Math.min(t.depth, depth) }))
        : tasks.filter((t) => t.depth <= depth),
    );
    return;
  }
  setQueued(queryRunner, undefined);
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
  if (!dataSource.subscribers.includes(afterTransaction)) dataSource.subscribers.push(afterTransaction);
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
  setQueued(qr, [...queued(qr), { depth: depthOf(qr), run: task }]);
}
