import { contract, type CallName, type CallResult } from '../../app/bridge/contract';
import { formatIssues, zodIssues, type ReviewIssue } from '../../app/review/parse';
import type { ServiceArgs, Services } from './types';

export type CallImpl<K extends CallName> = (args: ServiceArgs<K>) => Promise<CallResult<K>>;

/** The caller sent arguments the contract refuses (IPC: rejected; HTTP: 400). */
export class ArgsRejected extends Error {
  readonly issues: readonly ReviewIssue[];
  constructor(call: string, issues: readonly ReviewIssue[]) {
    super(`${call}: arguments refused by the contract:\n${formatIssues(issues)}`);
    this.name = 'ArgsRejected';
    this.issues = issues;
  }
}

export function isCallName(name: string): name is CallName {
  return Object.prototype.hasOwnProperty.call(contract, name);
}

/**
 * Validate the arguments with the call's schema, run the service, and validate its result too
 * (a result the contract refuses is a bug in main, reported as such, never passed on).
 */
export async function invokeCall<K extends CallName>(name: K, impl: CallImpl<K>, rawArgs: unknown): Promise<CallResult<K>> {
  const spec = contract[name];
  const args = spec.args.safeParse(rawArgs ?? {});
  if (!args.success) throw new ArgsRejected(name, zodIssues(args.error));
  const result = spec.result.safeParse(await impl(args.data as ServiceArgs<K>));
  if (!result.success) throw new Error(`${name}: main produced a result the contract refuses:\n${formatIssues(zodIssues(result.error))}`);
  return result.data as CallResult<K>;
}

/** invokeCall with the service of that name. */
export function invokeService<K extends CallName>(services: Services, name: K, rawArgs: unknown): Promise<CallResult<K>> {
  return invokeCall(name, services[name] as CallImpl<K>, rawArgs);
}
