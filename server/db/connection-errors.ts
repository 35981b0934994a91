const CONNECTION_CODES = new Set(['ECONNREFUSED', 'ECONNRESET', 'ETIMEDOUT', 'EPIPE', 'ENOTFOUND', '57P01', '57P02', '57P03', '08000', '08001', '08003', '08006']);

/** True when an error means "the database is not reachable right now" rather than a bad query. */
export function isConnectionError(err: unknown): boolean {
  const e = err as { code?: string; driverError?: { code?: string }; message?: string } | null;
  if (!e) return false;
  const code = e.code ?? e.driverError?.code;
  if (code && CONNECTION_CODES.has(code)) return true;
  const message = e.message ?? '';
  return /Connection terminated|connect ECONNREFUSED|timeout exceeded when trying to connect|Client has encountered a connection error|Connection terminated unexpectedly|DataSource is not initialized|CannotExecuteNotConnected|Cannot use a pool after calling end/i.test(
    message,
  );
}
