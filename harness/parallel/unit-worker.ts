import { parentPort, workerData } from 'node:worker_threads';
import { openAdapter, type OpenedAdapter } from '../cli/open-adapter.js';
import type { CheckContext, CheckGroup } from '../check-group.js';
import { executeUnit } from '../execute-unit.js';
import { contextFor, planGroups } from '../run-checks.js';
import { suitesOfRecipe } from '../run-recipe.js';
import type { FromWorker, ToWorker, WorkerSetup } from './worker-messages.js';

/**
 * A worker thread of the pool: opens its own adapter from the run's recipe, plans the same groups
 * (planning is a pure function of the settings), then runs the units it is sent one at a time.
 */
const port = parentPort!;
const setup = workerData as WorkerSetup;
const send = (message: FromWorker) => port.postMessage(message);

async function start(): Promise<{ opened: OpenedAdapter; groups: CheckGroup[]; context: CheckContext }> {
  const opened = await openAdapter(setup.recipe.adapter);
  const planned = planGroups(setup.recipe.settings, suitesOfRecipe(setup.recipe));
  const byId = new Map(planned.map((g) => [g.id, g]));
  const groups = setup.groupIds.map((id) => {
    const group = byId.get(id);
    if (group === undefined) throw new Error(`the worker's plan has no group '${id}'`);
    return group;
  });
  const description = await opened.adapter.describe();
  return { opened, groups, context: contextFor(opened.adapter, description, setup.recipe.settings) };
}

start().then(
  ({ opened, groups, context }) => {
    let queue = Promise.resolve();
    port.on('message', (message: ToWorker) => {
      queue = queue.then(async () => {
        if (message.kind === 'unit') {
          send({ kind: 'outcome', outcome: await executeUnit(groups[message.unit.group], message.unit, context) });
        } else {
          await opened.adapter.close();
          send({ kind: 'closed', log: opened.log() });
          port.close();
        }
      });
    });
    send({ kind: 'ready' });
  },
  (error: unknown) => {
    send({ kind: 'setup-failed', message: (error as Error)?.message ?? String(error) });
    port.close();
  },
);
