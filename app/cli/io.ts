export interface CliIo {
  out(text: string): void;
  err(text: string): void;
}

export const EXIT = { ok: 0, invalid: 1, usage: 2, mismatch: 3 } as const;

export class UsageError extends Error {}

export const USAGE = `usage:
  flankfilm review FILE [--json] [--pdf OUT] [--csv OUT] [--summary-csv OUT] [--map OUT.csv] [--p12 ID.p12] [--paper a4|letter]
  flankfilm sign FILE --reviewer NAME --role ROLE --decision approved|approved-with-conditions|not-approved
                 [--organisation ORG] [--conditions TEXT] [--signed-at ISO8601]
  flankfilm verify PDF [--review FILE]
  flankfilm schema
  flankfilm new [spur|helical] FILE
  flankfilm demo [DIR]
`;
