import type { FloorOperationDto, WorkLogDto } from '../../../shared/schemas/floor';
import { UNDO_WINDOW_MS } from '../../../shared/schemas/floor';
import type { BundleEntity, OperationEntity, WorkLogEntity } from '../../entities';

/** A quality check is logged pass or fail: recognised by its name or machine type. */
export const isCheckOperation = (op: Pick<OperationEntity, 'name' | 'machineType'>) =>
  /quality|inspect|check/i.test(op.name) || /^(qc|inspection|check)/i.test(op.machineType);

export const presentOperation = (op: OperationEntity, isMine: boolean): FloorOperationDto => ({
  id: op.id,
  code: op.code,
  name: op.name,
  section: op.section,
  machineType: op.machineType,
  sam: op.sam,
  predecessors: op.predecessors,
  isMine,
  isCheck: isCheckOperation(op),
});

export function presentLog(
  log: WorkLogEntity,
  bundle: Pick<BundleEntity, 'number' | 'batchId'>,
  op: Pick<OperationEntity, 'code' | 'name'>,
  userName: string,
  currency: string,
): WorkLogDto {
  const created = new Date(log.createdAt);
  return {
    id: log.id,
    bundleId: log.bundleId,
    bundleNumber: bundle.number,
    batchId: bundle.batchId,
    operationId: log.operationId,
    operationCode: op.code,
    operationName: op.name,
    attempt: log.attempt,
    pieces: log.pieces,
    earnedMinutes: log.earnedMinutes,
    payMinor: log.payMinor,
    currency,
    outcome: log.outcome,
    defect: log.defect,
    userId: log.userId,
    userName,
    createdAt: created.toISOString(),
    undoUntil: new Date(created.getTime() + UNDO_WINDOW_MS).toISOString(),
  };
}
