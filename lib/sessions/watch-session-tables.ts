import type { ModelStatic, Model, Transaction } from 'sequelize';
import { forgetSessionActors } from './remember-session-actors';
import { announceSessionChange } from './listen-session-changes';

type SessionTable = ModelStatic<Model>;
const HOOK_NAME = 'nodewright-session-memory';
const HOOKS = ['afterUpdate', 'afterDestroy', 'afterBulkUpdate', 'afterBulkDestroy'] as const;

/**
 * Installs, on the models whose rows decide who a session is (users and
 * auth_sessions), hooks that run after every update and delete made through
 * them: the remembered sessions are forgotten now, again when the
 * statement's transaction commits (a lookup during it read the old rows),
 * and on PostgreSQL every other instance is told (listen-session-changes.ts).
 * Inserts change nothing remembered: a new session or person is read when
 * first seen. Hooks are Sequelize's model lifecycle events; every write of
 * the app to these tables goes through the models.
 */
export function watchSessionTables(models: SessionTable[]): void {
  for (const model of models) {
    for (const hook of HOOKS) {
      // Once per model, however often the models are initialised (tests open several databases).
      model.removeHook(hook, HOOK_NAME);
      model.addHook(hook, HOOK_NAME, async (...args: unknown[]) => {
        const options = args[args.length - 1] as { transaction?: Transaction | null } | undefined;
        await sessionTablesChanged(model, options?.transaction ?? null);
      });
    }
  }
}

async function sessionTablesChanged(model: SessionTable, transaction: Transaction | null): Promise<void> {
  forgetSessionActors();
  transaction?.afterCommit(() => forgetSessionActors());
  if (model.sequelize) await announceSessionChange(model.sequelize, transaction);
}
