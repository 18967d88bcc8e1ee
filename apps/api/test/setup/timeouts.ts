// Each API test file starts the whole app over its own database and signs people in (scrypt):
// seconds, not milliseconds, on a busy two-core machine.
jest.setTimeout(30_000);
