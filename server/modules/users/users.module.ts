import type { ApiModule, ModuleContext } from '../module';
import { createUserRepository } from './user.repository';
import { userRoutes } from './user.routes';
import { createUserService } from './user.service';

/** The studio's people: the owner adds, changes and deactivates them at /api/users; auth reads `users`. */
export function createUsersModule(ctx: ModuleContext) {
  const users = createUserRepository(ctx.ds);
  const service = createUserService({ users, audit: ctx.audit });
  return {
    name: 'users',
    services: { users },
    mount(api) {
      api.use('/users', userRoutes(service));
    },
  } satisfies ApiModule & { services: unknown };
}
