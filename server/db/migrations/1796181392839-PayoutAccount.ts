import type { MigrationInterface, QueryRunner } from 'typeorm';

export class PayoutAccount1796181392839 implements MigrationInterface {
  name = 'PayoutAccount1796181392839';

  public async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`DROP INDEX "IDX_97672ac88f789774dd47f7c8be"`);
    await queryRunner.query(`CREATE TABLE "temporary_users" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "studioId" integer NOT NULL, "name" varchar(120) NOT NULL, "email" varchar(200) NOT NULL, "role" varchar(16) NOT NULL, "passwordHash" varchar(255) NOT NULL, "pinHash" varchar(255), "mustChangePassword" boolean NOT NULL DEFAULT (0), "active" boolean NOT NULL DEFAULT (1), "failedLogins" integer NOT NULL DEFAULT (0), "lockedUntil" datetime, "sessionVersion" integer NOT NULL DEFAULT (1), "createdAt" datetime NOT NULL DEFAULT (datetime('now')), "payoutAccount" varchar(64) NOT NULL DEFAULT (''), CONSTRAINT "FK_819f4cf5ade23efbae751c9a1fb" FOREIGN KEY ("studioId") REFERENCES "studios" ("id") ON DELETE CASCADE ON UPDATE NO ACTION)`);
    await queryRunner.query(`INSERT INTO "temporary_users"("id", "studioId", "name", "email", "role", "passwordHash", "pinHash", "mustChangePassword", "active", "failedLogins", "lockedUntil", "sessionVersion", "createdAt") SELECT "id", "studioId", "name", "email", "role", "passwordHash", "pinHash", "mustChangePassword", "active", "failedLogins", "lockedUntil", "sessionVersion", "createdAt" FROM "users"`);
    await queryRunner.query(`DROP TABLE "users"`);
    await queryRunner.query(`ALTER TABLE "temporary_users" RENAME TO "users"`);
    await queryRunner.query(`CREATE UNIQUE INDEX "IDX_97672ac88f789774dd47f7c8be" ON "users" ("email") `);
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`DROP INDEX "IDX_97672ac88f789774dd47f7c8be"`);
    await queryRunner.query(`ALTER TABLE "users" RENAME TO "temporary_users"`);
    await queryRunner.query(`CREATE TABLE "users" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "studioId" integer NOT NULL, "name" varchar(120) NOT NULL, "email" varchar(200) NOT NULL, "role" varchar(16) NOT NULL, "passwordHash" varchar(255) NOT NULL, "pinHash" varchar(255), "mustChangePassword" boolean NOT NULL DEFAULT (0), "active" boolean NOT NULL DEFAULT (1), "failedLogins" integer NOT NULL DEFAULT (0), "lockedUntil" datetime, "sessionVersion" integer NOT NULL DEFAULT (1), "createdAt" datetime NOT NULL DEFAULT (datetime('now')), CONSTRAINT "FK_819f4cf5ade23efbae751c9a1fb" FOREIGN KEY ("studioId") REFERENCES "studios" ("id") ON DELETE CASCADE ON UPDATE NO ACTION)`);
    await queryRunner.query(`INSERT INTO "users"("id", "studioId", "name", "email", "role", "passwordHash", "pinHash", "mustChangePassword", "active", "failedLogins", "lockedUntil", "sessionVersion", "createdAt") SELECT "id", "studioId", "name", "email", "role", "passwordHash", "pinHash", "mustChangePassword", "active", "failedLogins", "lockedUntil", "sessionVersion", "createdAt" FROM "temporary_users"`);
    await queryRunner.query(`DROP TABLE "temporary_users"`);
    await queryRunner.query(`CREATE UNIQUE INDEX "IDX_97672ac88f789774dd47f7c8be" ON "users" ("email") `);
  }
}
