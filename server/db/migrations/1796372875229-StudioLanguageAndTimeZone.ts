import type { MigrationInterface, QueryRunner } from 'typeorm';

export class StudioLanguageAndTimeZone1796372875229 implements MigrationInterface {
  name = 'StudioLanguageAndTimeZone1796372875229';

  public async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`CREATE TABLE "temporary_studios" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "name" varchar(120) NOT NULL, "currency" varchar(3) NOT NULL, "unitSystem" varchar(8) NOT NULL DEFAULT ('metric'), "workingDayHours" real NOT NULL DEFAULT (8), "createdAt" datetime NOT NULL DEFAULT (datetime('now')), "machines" text, "language" varchar(8) NOT NULL DEFAULT ('en'), "timeZone" varchar(64) NOT NULL DEFAULT ('UTC'))`);
    await queryRunner.query(`INSERT INTO "temporary_studios"("id", "name", "currency", "unitSystem", "workingDayHours", "createdAt", "machines") SELECT "id", "name", "currency", "unitSystem", "workingDayHours", "createdAt", "machines" FROM "studios"`);
    await queryRunner.query(`DROP TABLE "studios"`);
    await queryRunner.query(`ALTER TABLE "temporary_studios" RENAME TO "studios"`);
    await queryRunner.query(`DROP INDEX "IDX_97672ac88f789774dd47f7c8be"`);
    await queryRunner.query(`CREATE TABLE "temporary_users" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "studioId" integer NOT NULL, "name" varchar(120) NOT NULL, "email" varchar(200) NOT NULL, "role" varchar(16) NOT NULL, "passwordHash" varchar(255) NOT NULL, "pinHash" varchar(255), "mustChangePassword" boolean NOT NULL DEFAULT (0), "active" boolean NOT NULL DEFAULT (1), "failedLogins" integer NOT NULL DEFAULT (0), "lockedUntil" datetime, "sessionVersion" integer NOT NULL DEFAULT (1), "createdAt" datetime NOT NULL DEFAULT (datetime('now')), "payoutAccount" varchar(64) NOT NULL DEFAULT (''), "pinFailures" integer NOT NULL DEFAULT (0), "pinLockedUntil" datetime, "skills" text, "language" varchar(8), CONSTRAINT "FK_819f4cf5ade23efbae751c9a1fb" FOREIGN KEY ("studioId") REFERENCES "studios" ("id") ON DELETE CASCADE ON UPDATE NO ACTION)`);
    await queryRunner.query(`INSERT INTO "temporary_users"("id", "studioId", "name", "email", "role", "passwordHash", "pinHash", "mustChangePassword", "active", "failedLogins", "lockedUntil", "sessionVersion", "createdAt", "payoutAccount", "pinFailures", "pinLockedUntil", "skills") SELECT "id", "studioId", "name", "email", "role", "passwordHash", "pinHash", "mustChangePassword", "active", "failedLogins", "lockedUntil", "sessionVersion", "createdAt", "payoutAccount", "pinFailures", "pinLockedUntil", "skills" FROM "users"`);
    await queryRunner.query(`DROP TABLE "users"`);
    await queryRunner.query(`ALTER TABLE "temporary_users" RENAME TO "users"`);
    await queryRunner.query(`CREATE UNIQUE INDEX "IDX_97672ac88f789774dd47f7c8be" ON "users" ("email") `);
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`DROP INDEX "IDX_97672ac88f789774dd47f7c8be"`);
    await queryRunner.query(`ALTER TABLE "users" RENAME TO "temporary_users"`);
    await queryRunner.query(`CREATE TABLE "users" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "studioId" integer NOT NULL, "name" varchar(120) NOT NULL, "email" varchar(200) NOT NULL, "role" varchar(16) NOT NULL, "passwordHash" varchar(255) NOT NULL, "pinHash" varchar(255), "mustChangePassword" boolean NOT NULL DEFAULT (0), "active" boolean NOT NULL DEFAULT (1), "failedLogins" integer NOT NULL DEFAULT (0), "lockedUntil" datetime, "sessionVersion" integer NOT NULL DEFAULT (1), "createdAt" datetime NOT NULL DEFAULT (datetime('now')), "payoutAccount" varchar(64) NOT NULL DEFAULT (''), "pinFailures" integer NOT NULL DEFAULT (0), "pinLockedUntil" datetime, "skills" text, CONSTRAINT "FK_819f4cf5ade23efbae751c9a1fb" FOREIGN KEY ("studioId") REFERENCES "studios" ("id") ON DELETE CASCADE ON UPDATE NO ACTION)`);
    await queryRunner.query(`INSERT INTO "users"("id", "studioId", "name", "email", "role", "passwordHash", "pinHash", "mustChangePassword", "active", "failedLogins", "lockedUntil", "sessionVersion", "createdAt", "payoutAccount", "pinFailures", "pinLockedUntil", "skills") SELECT "id", "studioId", "name", "email", "role", "passwordHash", "pinHash", "mustChangePassword", "active", "failedLogins", "lockedUntil", "sessionVersion", "createdAt", "payoutAccount", "pinFailures", "pinLockedUntil", "skills" FROM "temporary_users"`);
    await queryRunner.query(`DROP TABLE "temporary_users"`);
    await queryRunner.query(`CREATE UNIQUE INDEX "IDX_97672ac88f789774dd47f7c8be" ON "users" ("email") `);
    await queryRunner.query(`ALTER TABLE "studios" RENAME TO "temporary_studios"`);
    await queryRunner.query(`CREATE TABLE "studios" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "name" varchar(120) NOT NULL, "currency" varchar(3) NOT NULL, "unitSystem" varchar(8) NOT NULL DEFAULT ('metric'), "workingDayHours" real NOT NULL DEFAULT (8), "createdAt" datetime NOT NULL DEFAULT (datetime('now')), "machines" text)`);
    await queryRunner.query(`INSERT INTO "studios"("id", "name", "currency", "unitSystem", "workingDayHours", "createdAt", "machines") SELECT "id", "name", "currency", "unitSystem", "workingDayHours", "createdAt", "machines" FROM "temporary_studios"`);
    await queryRunner.query(`DROP TABLE "temporary_studios"`);
  }
}
