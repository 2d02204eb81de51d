// vitest runs outside the react-server condition, where the real "server-only" throws on import.
export {};
