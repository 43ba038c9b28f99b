import type { FuzzOptions } from './fuzzer';

/** The output checks the fuzzer applies; the record's checks join when app/report is present. */
export function fuzzOutputs(): Pick<FuzzOptions, 'csv' | 'recordText'> {
  return {};
}
