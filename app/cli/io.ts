export interface CliIo {
  out(text: string): void;
  err(text: string): void;
}

/** 4 (`verify`): a record made by another engine version; what could be checked agrees, the pages were not checked. */
export const EXIT = { ok: 0, invalid: 1, usage: 2, mismatch: 3, partial: 4 } as const;

export class UsageError extends Error {}

export const USAGE = `usage:
  flankfilm review FILE [--json] [--pdf OUT [--film-detail]] [--csv OUT] [--summary-csv OUT] [--map OUT.csv] [--p12 ID.p12] [--paper a4|letter]
  flankfilm sign FILE --reviewer NAME --role ROLE --decision approved|approved-with-conditions|not-approved
                 [--organisation ORG] [--conditions TEXT] [--signed-at ISO8601]
  flankfilm verify PDF [--review FILE]
  flankfilm diff REVIEW [OTHER] [--json]   changes since signing, or from REVIEW to OTHER (exit 0 none, 3 some)
  flankfilm schema [--oils]
  flankfilm fleet FILES|DIR --oils CANDIDATES [--json] [--csv OUT] [--pdf OUT] [--paper a4|letter]
  flankfilm new [spur|helical|internal|planetary] FILE
  flankfilm demo [DIR]
  flankfilm ehl REVIEW --case NAME [--oil NAME] --at A|B|C|D|E|lambda-min|POSITION_mm [--nodes N] [--law roelands|barus] [--json]
`;
