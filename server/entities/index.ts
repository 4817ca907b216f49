import { AuditEntryEntity } from './audit-entry.entity';
import { BatchEntity } from './batch.entity';
import { SessionEntity } from './session.entity';
import { StudioEntity } from './studio.entity';
import { StyleEntity } from './style.entity';
import { UserEntity } from './user.entity';

export { AuditEntryEntity, BatchEntity, SessionEntity, StudioEntity, StyleEntity, UserEntity };

/** Every entity the data source knows. */
export const entities = [
  StudioEntity,
  UserEntity,
  StyleEntity,
  BatchEntity,
  AuditEntryEntity,
  SessionEntity,
];
