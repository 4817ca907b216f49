import type { CostingService } from '../costing/costing.service';
import type { MailService } from '../mail/mail.service';
import type { ApiModule } from '../module';
import { createPurchasingRepository } from './purchasing.repository';
import { purchasingRoutes } from './purchasing.routes';
import { createPurchasingService } from './purchasing.service';

/**
 * The purchasing area: suppliers, a batch's fabric and trim needs net of stock, purchase orders per
 * supplier (draft → sent → confirmed → received), e-mailed with their workbook through ctx.services 'mail',
 * and received into stock (rolls for fabric). Reads ctx.services 'costing' for the batch's quantities.
 */
export const purchasingModule: ApiModule = {
  name: 'purchasing',
  register(api, ctx) {
    const repo = createPurchasingRepository(ctx.ds);
    const service = createPurchasingService({
      repo,
      costing: () => ctx.services.get('costing') as CostingService,
      mail: () => ctx.services.get('mail') as MailService,
      jobs: ctx.jobs,
      now: ctx.now,
    });
    api.use('/purchasing', purchasingRoutes(repo, service, ctx));
  },
};
