import pino from "pino";

/** Structured server logs: one JSON line per event. Errors carry their context, never reach users raw. */
export const logger = pino({
  level: process.env.LOG_LEVEL ?? (process.env.NODE_ENV === "test" ? "silent" : "info"),
  base: { app: "spanlark" },
  redact: { paths: ["password", "*.password", "passwordHash", "*.passwordHash", "token", "*.token"], remove: true },
});
