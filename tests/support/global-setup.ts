// Integration tests need a database; scripts/test.sh starts PostgreSQL and sets TEST_DATABASE_URL.
// Pure unit tests (solver, design) run without it.
export default function setup(): void {}
