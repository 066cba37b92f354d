import type { MigrationInterface, QueryRunner } from 'typeorm';

/** The table @socket.io/postgres-adapter uses for large payloads; it does not create it itself. */
export class SocketIoAttachments1764627500000 implements MigrationInterface {
  name = 'SocketIoAttachments1764627500000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(
      `CREATE TABLE socket_io_attachments (id bigserial UNIQUE, created_at timestamptz DEFAULT now(), payload bytea)`,
    );
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query(`DROP TABLE socket_io_attachments`);
  }
}
