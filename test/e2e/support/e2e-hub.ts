/** The port the journeys' hub listens on (E2E_PORT, default 4391). */
export const e2ePort = () => Number(process.env['E2E_PORT'] ?? 4391);

/** Where the journeys open the app. */
export const e2eBaseUrl = () => `http://127.0.0.1:${e2ePort()}`;
