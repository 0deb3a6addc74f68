/**
 * Error codes of the process protocol (PROTOCOL.md, "Errors"). The negative codes are JSON-RPC 2.0's
 * own (JSON-RPC 2.0 Specification, 2010, §5.1 "Error object"); -32000 lies in the range the
 * specification reserves for implementation-defined server errors; 1001 and 1002 are ours,
 * outside every reserved range.
 */
export const PROTOCOL_ERROR_CODES = {
  parseError: -32700,
  invalidRequest: -32600,
  methodNotFound: -32601,
  invalidParams: -32602,
  internalError: -32603,
  /** The implementation's computation failed (an exception in the user's code). */
  computationFailed: -32000,
  /** A `sample` request names an ensemble the implementation does not sample: the harness skips. */
  ensembleNotOffered: 1001,
  /** The implementation cannot answer this particular request (a case it does not cover): skipped. */
  notAvailable: 1002,
} as const;
