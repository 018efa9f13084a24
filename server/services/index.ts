import { accountService } from '@/server/services/accounts';
import { coilService } from '@/server/services/coils';
import type { ServiceDeps } from '@/server/services/context';
import { outboxService } from '@/server/services/outbox';
import { projectService } from '@/server/services/projects';
import { teamService } from '@/server/services/teams';

export function createServices(deps: ServiceDeps) {
  return {
    accounts: accountService(deps),
    teams: teamService(deps),
    projects: projectService(deps),
    coils: coilService(deps),
    outbox: outboxService(deps),
    solve: deps.solve,
  };
}

export type Services = ReturnType<typeof createServices>;
