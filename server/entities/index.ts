import { AttendanceEntity } from './attendance.entity';
import { AuditEntryEntity } from './audit-entry.entity';
import { BatchEntity } from './batch.entity';
import { BundleEntity } from './bundle.entity';
import { CostingSettingsEntity } from './costing-settings.entity';
import { CutPlanEntity } from './cut-plan.entity';
import { FabricEntity } from './fabric.entity';
import { FloorDeviceEntity } from './floor-device.entity';
import { GradingSetEntity } from './grading-set.entity';
import { LayEntity } from './lay.entity';
import { MailMessageEntity } from './mail-message.entity';
import { MarkerEntity } from './marker.entity';
import { OperationEntity } from './operation.entity';
import { PayPeriodEntity } from './pay-period.entity';
import { PayoutEntity } from './payout.entity';
import { PurchaseOrderEntity } from './purchase-order.entity';
import { RollEntity } from './roll.entity';
import { RollReservationEntity } from './roll-reservation.entity';
import { SessionEntity } from './session.entity';
import { SignInThrottleEntity } from './sign-in-throttle.entity';
import { StudioEntity } from './studio.entity';
import { StudioWorkRulesEntity } from './studio-work-rules.entity';
import { StyleEntity } from './style.entity';
import { SupplierEntity } from './supplier.entity';
import { TrimEntity } from './trim.entity';
import { UploadEntity } from './upload.entity';
import { UserEntity } from './user.entity';
import { WorkLogEntity } from './work-log.entity';

export {
  AttendanceEntity,
  AuditEntryEntity,
  BatchEntity,
  BundleEntity,
  CostingSettingsEntity,
  CutPlanEntity,
  FabricEntity,
  FloorDeviceEntity,
  GradingSetEntity,
  LayEntity,
  MailMessageEntity,
  MarkerEntity,
  OperationEntity,
  PayPeriodEntity,
  PayoutEntity,
  PurchaseOrderEntity,
  RollEntity,
  RollReservationEntity,
  SessionEntity,
  SignInThrottleEntity,
  StudioEntity,
  StudioWorkRulesEntity,
  StyleEntity,
  SupplierEntity,
  TrimEntity,
  UploadEntity,
  UserEntity,
  WorkLogEntity,
};

/** Every entity the data source knows. */
export const entities = [
  StudioEntity,
  UserEntity,
  StyleEntity,
  BatchEntity,
  AuditEntryEntity,
  SessionEntity,
  FabricEntity,
  RollEntity,
  GradingSetEntity,
  MarkerEntity,
  CutPlanEntity,
  LayEntity,
  BundleEntity,
  OperationEntity,
  WorkLogEntity,
  AttendanceEntity,
  PayPeriodEntity,
  PayoutEntity,
  SupplierEntity,
  TrimEntity,
  CostingSettingsEntity,
  PurchaseOrderEntity,
  MailMessageEntity,
  UploadEntity,
  FloorDeviceEntity,
  RollReservationEntity,
  SignInThrottleEntity,
  StudioWorkRulesEntity,
];
