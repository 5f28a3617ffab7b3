import { defineConfig } from 'vitest/config';

export default defineConfig({
  test: {
    name: 'server',
    include: ['src/**/*.test.ts', 'test/**/*.test.ts'],
    // Each vitest worker has a database of its own (test/worker-database.ts), so files run side
    // by side. They also share one module graph per worker: importing the server and Nest anew
    // for every file took most of the project's time (about 220 s of 240 s on two workers).
    // Every file builds its own Nest application and empties the tables it uses, so nothing
    // carries over from one file to the next but the compiled modules.
    isolate: false,
    testTimeout: 30000,
    hookTimeout: 60000,
  },
});
