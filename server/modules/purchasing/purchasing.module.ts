import type { CostingService } from '../costing/costing.service';
import type { MailService } from '../mail/mail.service';
import type { ApiModule, ModuleContext } from '../module';
import { createPurchasingRepository } from './purchasing.repository';
import { purchasingRoutes } from './purchasing.routes';
import { createPurchasingService } from './purchasing.service';

/**
 * The purchasing area: suppliers, a batch's fabric and trim needs net of stock, purchase orders per
 * supplier (draft → sent → confirmed → received), e-mailed with their workbook through the mail service,
 * and received into stock (rolls for fabric). Reads the costing service for the batch's quantities.
 */
export function createPurchasingModule(ctx: ModuleContext, deps: { costing: CostingService; mail: MailService }) {
  const repo = createPurchasingRepository(ctx.ds);
  const purchasing = createPurchasingService({ repo, costing: () => deps.costing, mail: () => deps.mail, jobs: ctx.jobs, now: ctx.now });
  return {
    name: 'purchasing',
    services: { purchasing },
    mount(api) {
      api.use('/purchasing', purchasingRoutes(repo, purchasing, ctx));
    },
  } satisfies ApiModule & { services: unknown };
}
