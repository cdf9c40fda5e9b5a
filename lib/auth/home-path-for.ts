import { decideGlobal, type Actor } from './permissions';

/** Where a person lands after sign-in when no page was asked for: a customer on the portal of what was released to them, staff on the memo list. */
export function homePathFor(actor: Actor): string {
  return decideGlobal(actor, 'portal.view').allowed ? '/portal' : '/memos';
}
