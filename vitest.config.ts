import { defineConfig } from 'vitest/config';

// Many tests run the whole check (ride model, stock planner, plots) through
// the CLI; under a full parallel run one can take several seconds. Time is
// measured by `npm run bench`, never by a unit test, so the limit here only
// catches a hang.
export default defineConfig({
  test: { testTimeout: 60_000, hookTimeout: 120_000 },
});
