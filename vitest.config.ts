import { defineConfig } from "vitest/config";

export default defineConfig({
  test: {
    include: ["test/**/*.test.ts"],
    globalSetup: ["test/setup/chromium.ts"],
    testTimeout: 120_000,
    // a site build of the whole catalog in a beforeAll: ~2 CPU min when the machine is quiet, far more
    // on a shared 2-core machine under load (a 300 s budget ran out there); a budget, not a timing check
    hookTimeout: 1_200_000,
  },
});
