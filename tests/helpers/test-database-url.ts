/** Tests only ever touch a database whose name says it is for tests. */
export function testDatabaseUrl(): string {
  const url = process.env.DATABASE_URL ?? `postgres://shoalwise@127.0.0.1:${process.env.PGPORT ?? 5487}/shoalwise_test`;
  if (!/_test(\?|$)/.test(new URL(url).pathname + (new URL(url).search ? '?' : ''))) {
    throw new Error(`Refusing to run tests against ${url}: the database name must end in _test (./scripts/test sets it up).`);
  }
  return url;
}
