// Every unit test process uses the throw-away test database and a fixed secret.
process.env.KNEX_ENV = 'test';
process.env.NEXTAUTH_SECRET ??= 'unit-test-secret';
process.env.APP_URL = 'http://tenderline.test';
