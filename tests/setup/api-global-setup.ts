// The API tests need the services `npm test` starts (scripts/test.ts); run
// them through it: `npm test -- vitest --project api`.
export default function setup() {
  if (!process.env.DATABASE_URL || !process.env.MAIL_FAKE_DIR) {
    throw new Error('Run the API tests through `npm test -- vitest --project api`, which starts their services.');
  }
}
