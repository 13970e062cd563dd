// Every unit test process uses a throw-away database and a fixed secret: SQLite in memory, or the
// PostgreSQL database named by TEST_DATABASE_URL (the PostgreSQL leg of the test run).
if (process.env.TEST_DATABASE_URL) {
  process.env.KNEX_ENV = 'production';
  process.env.DATABASE_URL = process.env.TEST_DATABASE_URL;
} else {
  process.env.KNEX_ENV = 'test';
}
process.env.NEXTAUTH_SECRET ??= 'unit-test-secret';
process.env.APP_URL = 'http://tenderline.test';
// The model runs inline in the unit leg, so tests may spy on it; `npm run test:pool` runs the
// check suites again against the real worker threads (the built dist/ bundle).
process.env.TENDERLINE_INLINE_COMPUTE ??= '1';
