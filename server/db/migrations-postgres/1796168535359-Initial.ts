import type { MigrationInterface, QueryRunner } from 'typeorm';

export class Initial1796168535359 implements MigrationInterface {
  name = 'Initial1796168535359';

  public async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`CREATE TABLE "attendance" ("id" SERIAL NOT NULL, "studioId" integer NOT NULL, "userId" integer NOT NULL, "day" character varying(10) NOT NULL, "minutes" real NOT NULL, CONSTRAINT "PK_ee0ffe42c1f1a01e72b725c0cb2" PRIMARY KEY ("id"))`);
    await queryRunner.query(`CREATE UNIQUE INDEX "IDX_ea57146c900a178d4994c39dcc" ON "attendance"  ("studioId", "userId", "day") `);
    await queryRunner.query(`CREATE TABLE "audit_entries" ("id" SERIAL NOT NULL, "studioId" integer NOT NULL, "userId" integer, "userName" character varying(120) NOT NULL DEFAULT '', "action" character varying(40) NOT NULL, "entity" character varying(40) NOT NULL, "entityId" integer, "before" text NOT NULL DEFAULT '', "after" text NOT NULL DEFAULT '', "createdAt" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), CONSTRAINT "PK_6b1623bcad4d04530b76548d619" PRIMARY KEY ("id"))`);
    await queryRunner.query(`CREATE INDEX "IDX_dbd6ed6fd46fdf10e397b7dd13" ON "audit_entries"  ("studioId", "createdAt") `);
    await queryRunner.query(`CREATE TABLE "styles" ("id" SERIAL NOT NULL, "studioId" integer NOT NULL, "code" character varying(24) NOT NULL, "name" character varying(120) NOT NULL, "description" text NOT NULL DEFAULT '', "sizeRun" text NOT NULL, "baseSize" character varying(12) NOT NULL, "status" character varying(16) NOT NULL DEFAULT 'draft', "createdAt" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), "updatedAt" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), CONSTRAINT "PK_1f22d2e5045f508c5fce0eb6e86" PRIMARY KEY ("id"))`);
    await queryRunner.query(`CREATE UNIQUE INDEX "IDX_fa12072b538d463a9b9b541285" ON "styles"  ("studioId", "code") `);
    await queryRunner.query(`CREATE TABLE "batches" ("id" SERIAL NOT NULL, "studioId" integer NOT NULL, "styleId" integer NOT NULL, "quantities" text NOT NULL, "dueDate" character varying(10) NOT NULL, "status" character varying(16) NOT NULL DEFAULT 'planned', "notes" text NOT NULL DEFAULT '', "createdAt" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), CONSTRAINT "PK_55e7ff646e969b61d37eea5be7a" PRIMARY KEY ("id"))`);
    await queryRunner.query(`CREATE TABLE "bundles" ("id" SERIAL NOT NULL, "studioId" integer NOT NULL, "batchId" integer NOT NULL, "layId" integer NOT NULL, "number" integer NOT NULL, "size" character varying(12) NOT NULL, "shadeLot" character varying(40) NOT NULL, "plyFrom" integer NOT NULL, "plyTo" integer NOT NULL, "pieces" integer NOT NULL, "reopened" text NOT NULL, "createdAt" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), CONSTRAINT "PK_a9118b2e4597aede4d5d4c43433" PRIMARY KEY ("id"))`);
    await queryRunner.query(`CREATE UNIQUE INDEX "IDX_d560b96b8168fec10a362ae3aa" ON "bundles"  ("studioId", "batchId", "number") `);
    await queryRunner.query(`CREATE TABLE "costing_settings" ("id" SERIAL NOT NULL, "studioId" integer NOT NULL, "styleId" integer NOT NULL, "labourCostPerMinuteMinor" integer NOT NULL, "overheadPercent" real NOT NULL DEFAULT '0', "wastagePercent" real NOT NULL DEFAULT '3', "marginPercent" real NOT NULL DEFAULT '20', "retailMultiplier" real NOT NULL DEFAULT '2', CONSTRAINT "PK_2cf43b66a181dae7cf80a39f26b" PRIMARY KEY ("id"))`);
    await queryRunner.query(`CREATE UNIQUE INDEX "IDX_79adc92f9fef7133fad4b9bd3a" ON "costing_settings"  ("studioId", "styleId") `);
    await queryRunner.query(`CREATE TABLE "cut_plans" ("id" SERIAL NOT NULL, "studioId" integer NOT NULL, "batchId" integer NOT NULL, "fabricId" integer NOT NULL, "input" text NOT NULL, "result" text NOT NULL, "fabricUsedMm" real NOT NULL, "lowerBoundMm" real NOT NULL, "status" character varying(12) NOT NULL DEFAULT 'draft', "createdAt" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), CONSTRAINT "PK_18fd30f834cf9342ba499b884e1" PRIMARY KEY ("id"))`);
    await queryRunner.query(`CREATE TABLE "fabrics" ("id" SERIAL NOT NULL, "studioId" integer NOT NULL, "name" character varying(120) NOT NULL, "composition" character varying(200) NOT NULL DEFAULT '', "widthMm" real NOT NULL, "shrinkagePercent" real NOT NULL DEFAULT '0', "isDirectional" boolean NOT NULL DEFAULT false, "pricePerMetreMinor" integer NOT NULL DEFAULT '0', "supplierId" integer, "maxPlies" integer NOT NULL DEFAULT '40', "createdAt" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), CONSTRAINT "PK_154ff1486274ec43fcea1e04a66" PRIMARY KEY ("id"))`);
    await queryRunner.query(`CREATE TABLE "grading_sets" ("id" SERIAL NOT NULL, "studioId" integer NOT NULL, "styleId" integer NOT NULL, "sizeChart" text NOT NULL, "pieces" text NOT NULL, "gradeRules" text NOT NULL, "eases" text NOT NULL, "updatedAt" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), CONSTRAINT "PK_353518307b6cdf6bba553f44e35" PRIMARY KEY ("id"))`);
    await queryRunner.query(`CREATE UNIQUE INDEX "IDX_cbdc2598d7688c754ea5ab588c" ON "grading_sets"  ("studioId", "styleId") `);
    await queryRunner.query(`CREATE TABLE "lays" ("id" SERIAL NOT NULL, "studioId" integer NOT NULL, "cutPlanId" integer NOT NULL, "batchId" integer NOT NULL, "seq" integer NOT NULL, "ratio" text NOT NULL, "plies" integer NOT NULL, "markerLengthMm" real NOT NULL, "endAllowanceMm" real NOT NULL, "markerId" integer, "spreadingMode" character varying(24) NOT NULL, "rolls" text NOT NULL, "status" character varying(12) NOT NULL DEFAULT 'planned', "flaws" text NOT NULL DEFAULT '', "cutAt" TIMESTAMP WITH TIME ZONE, "createdAt" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), CONSTRAINT "PK_4b4f0c0bb74240d9c01957bb6d4" PRIMARY KEY ("id"))`);
    await queryRunner.query(`CREATE UNIQUE INDEX "IDX_fffd4b509d74360d6e7d296286" ON "lays"  ("studioId", "cutPlanId", "seq") `);
    await queryRunner.query(`CREATE TABLE "mail_messages" ("id" SERIAL NOT NULL, "studioId" integer NOT NULL, "to" character varying(200) NOT NULL, "subject" character varying(300) NOT NULL, "text" text NOT NULL, "attachments" text NOT NULL, "messageId" character varying(200) NOT NULL DEFAULT '', "status" character varying(12) NOT NULL DEFAULT 'sent', "createdAt" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), CONSTRAINT "PK_1bd6e76ef3b3d4aff7d0510a509" PRIMARY KEY ("id"))`);
    await queryRunner.query(`CREATE TABLE "markers" ("id" SERIAL NOT NULL, "studioId" integer NOT NULL, "styleId" integer NOT NULL, "batchId" integer, "fabricId" integer, "ratio" text NOT NULL, "widthMm" real NOT NULL, "inputHash" character varying(64) NOT NULL, "status" character varying(12) NOT NULL DEFAULT 'queued', "lengthMm" real, "utilisation" real, "elapsedMs" real NOT NULL DEFAULT '0', "input" text, "result" text, "error" text NOT NULL DEFAULT '', "createdAt" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), CONSTRAINT "PK_05eb83870b9b88db9d4e949965c" PRIMARY KEY ("id"))`);
    await queryRunner.query(`CREATE INDEX "IDX_1e9c5c8f14d65bc8bc41926c6f" ON "markers"  ("studioId", "inputHash") `);
    await queryRunner.query(`CREATE TABLE "operations" ("id" SERIAL NOT NULL, "studioId" integer NOT NULL, "styleId" integer NOT NULL, "seq" integer NOT NULL, "code" character varying(12) NOT NULL, "name" character varying(120) NOT NULL, "section" character varying(12) NOT NULL, "machineType" character varying(24) NOT NULL, "sam" real NOT NULL, "predecessors" text NOT NULL, "pieceRateMinor" integer, CONSTRAINT "PK_7b62d84d6f9912b975987165856" PRIMARY KEY ("id"))`);
    await queryRunner.query(`CREATE INDEX "IDX_a5fda10bf6882e27e4fecbc05f" ON "operations"  ("studioId", "styleId", "seq") `);
    await queryRunner.query(`CREATE TABLE "pay_periods" ("id" SERIAL NOT NULL, "studioId" integer NOT NULL, "fromDay" character varying(10) NOT NULL, "toDay" character varying(10) NOT NULL, "status" character varying(12) NOT NULL DEFAULT 'approved', "approvedBy" integer NOT NULL, "lines" text NOT NULL, "createdAt" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), CONSTRAINT "PK_1eb133b5947dd46710dc78b94d7" PRIMARY KEY ("id"))`);
    await queryRunner.query(`CREATE TABLE "payouts" ("id" SERIAL NOT NULL, "studioId" integer NOT NULL, "payPeriodId" integer NOT NULL, "userId" integer NOT NULL, "amountMinor" integer NOT NULL, "currency" character varying(3) NOT NULL, "status" character varying(12) NOT NULL DEFAULT 'pending', "idempotencyKey" character varying(80) NOT NULL, "providerRef" character varying(120) NOT NULL DEFAULT '', "error" text NOT NULL DEFAULT '', "attempts" integer NOT NULL DEFAULT '0', "createdAt" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), "updatedAt" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), CONSTRAINT "PK_76855dc4f0a6c18c72eea302e87" PRIMARY KEY ("id"))`);
    await queryRunner.query(`CREATE UNIQUE INDEX "IDX_84a12a9110c12ee41ae80cc0f8" ON "payouts"  ("payPeriodId", "userId") `);
    await queryRunner.query(`CREATE TABLE "purchase_orders" ("id" SERIAL NOT NULL, "studioId" integer NOT NULL, "supplierId" integer NOT NULL, "batchId" integer, "status" character varying(12) NOT NULL DEFAULT 'draft', "lines" text NOT NULL, "deliveryDate" character varying(10) NOT NULL, "createdAt" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), "updatedAt" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), CONSTRAINT "PK_05148947415204a897e8beb2553" PRIMARY KEY ("id"))`);
    await queryRunner.query(`CREATE TABLE "rolls" ("id" SERIAL NOT NULL, "studioId" integer NOT NULL, "fabricId" integer NOT NULL, "label" character varying(40) NOT NULL, "lengthMm" real NOT NULL, "widthMm" real NOT NULL, "shadeLot" character varying(40) NOT NULL, "receivedDate" character varying(10) NOT NULL, "remainingMm" real NOT NULL, "isRemnant" boolean NOT NULL DEFAULT false, "createdAt" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), CONSTRAINT "PK_948f5c2e672b971942236cf4ec8" PRIMARY KEY ("id"))`);
    await queryRunner.query(`CREATE UNIQUE INDEX "IDX_065051debbc61e0ba44511b7cd" ON "rolls"  ("studioId", "label") `);
    await queryRunner.query(`CREATE TABLE "sessions" ("id" character varying(128) NOT NULL, "expiresAt" bigint NOT NULL, "data" text NOT NULL, CONSTRAINT "PK_3238ef96f18b355b671619111bc" PRIMARY KEY ("id"))`);
    await queryRunner.query(`CREATE INDEX "IDX_50762206f116cd47d1c3fec396" ON "sessions"  ("expiresAt") `);
    await queryRunner.query(`CREATE TABLE "studios" ("id" SERIAL NOT NULL, "name" character varying(120) NOT NULL, "currency" character varying(3) NOT NULL, "unitSystem" character varying(8) NOT NULL DEFAULT 'metric', "workingDayHours" real NOT NULL DEFAULT '8', "createdAt" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), CONSTRAINT "PK_76ff398ef5041c4b42618ed6111" PRIMARY KEY ("id"))`);
    await queryRunner.query(`CREATE TABLE "suppliers" ("id" SERIAL NOT NULL, "studioId" integer NOT NULL, "name" character varying(120) NOT NULL, "contact" character varying(120) NOT NULL DEFAULT '', "email" character varying(200) NOT NULL, "leadTimeDays" integer NOT NULL DEFAULT '7', "createdAt" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), CONSTRAINT "PK_b70ac51766a9e3144f778cfe81e" PRIMARY KEY ("id"))`);
    await queryRunner.query(`CREATE TABLE "trims" ("id" SERIAL NOT NULL, "studioId" integer NOT NULL, "styleId" integer NOT NULL, "name" character varying(120) NOT NULL, "unit" character varying(16) NOT NULL, "quantityPerGarment" real NOT NULL, "unitPriceMinor" integer NOT NULL, "supplierId" integer, "inStock" real NOT NULL DEFAULT '0', CONSTRAINT "PK_c9ba0db5b718956e9f8acce9d1e" PRIMARY KEY ("id"))`);
    await queryRunner.query(`CREATE INDEX "IDX_5c7928a550939385b13bab8bb8" ON "trims"  ("studioId", "styleId") `);
    await queryRunner.query(`CREATE TABLE "uploads" ("id" SERIAL NOT NULL, "studioId" integer NOT NULL, "kind" character varying(24) NOT NULL, "styleId" integer, "originalName" character varying(200) NOT NULL, "mimeType" character varying(80) NOT NULL, "size" integer NOT NULL, "storedName" character varying(200) NOT NULL, "uploadedBy" integer NOT NULL, "createdAt" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), CONSTRAINT "PK_d1781d1eedd7459314f60f39bd3" PRIMARY KEY ("id"))`);
    await queryRunner.query(`CREATE TABLE "users" ("id" SERIAL NOT NULL, "studioId" integer NOT NULL, "name" character varying(120) NOT NULL, "email" character varying(200) NOT NULL, "role" character varying(16) NOT NULL, "passwordHash" character varying(255) NOT NULL, "pinHash" character varying(255), "mustChangePassword" boolean NOT NULL DEFAULT false, "active" boolean NOT NULL DEFAULT true, "failedLogins" integer NOT NULL DEFAULT '0', "lockedUntil" TIMESTAMP WITH TIME ZONE, "sessionVersion" integer NOT NULL DEFAULT '1', "createdAt" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), CONSTRAINT "PK_a3ffb1c0c8416b9fc6f907b7433" PRIMARY KEY ("id"))`);
    await queryRunner.query(`CREATE UNIQUE INDEX "IDX_97672ac88f789774dd47f7c8be" ON "users"  ("email") `);
    await queryRunner.query(`CREATE TABLE "work_logs" ("id" SERIAL NOT NULL, "studioId" integer NOT NULL, "bundleId" integer NOT NULL, "operationId" integer NOT NULL, "attempt" integer NOT NULL DEFAULT '0', "userId" integer NOT NULL, "pieces" integer NOT NULL, "earnedMinutes" real NOT NULL, "payMinor" integer NOT NULL DEFAULT '0', "idempotencyKey" character varying(80) NOT NULL, "outcome" character varying(8) NOT NULL DEFAULT '', "defect" character varying(200) NOT NULL DEFAULT '', "createdAt" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), CONSTRAINT "PK_f4f3234af57451baa20576887be" PRIMARY KEY ("id"))`);
    await queryRunner.query(`CREATE UNIQUE INDEX "IDX_60a7b7186e96b938a631a4dcdd" ON "work_logs"  ("idempotencyKey") `);
    await queryRunner.query(`CREATE INDEX "IDX_4212da054af063c1d1c3ac8f64" ON "work_logs"  ("studioId", "userId", "createdAt") `);
    await queryRunner.query(`CREATE UNIQUE INDEX "IDX_87968b1601e391e8668f98df94" ON "work_logs"  ("bundleId", "operationId", "attempt") `);
    await queryRunner.query(`ALTER TABLE "batches" ADD CONSTRAINT "FK_04f7e14dcf087edadb0f02a95af" FOREIGN KEY ("styleId") REFERENCES "styles"("id") ON DELETE RESTRICT ON UPDATE NO ACTION`);
    await queryRunner.query(`ALTER TABLE "rolls" ADD CONSTRAINT "FK_7c93a04625a9bc94379054e18e2" FOREIGN KEY ("fabricId") REFERENCES "fabrics"("id") ON DELETE RESTRICT ON UPDATE NO ACTION`);
    await queryRunner.query(`ALTER TABLE "users" ADD CONSTRAINT "FK_819f4cf5ade23efbae751c9a1fb" FOREIGN KEY ("studioId") REFERENCES "studios"("id") ON DELETE CASCADE ON UPDATE NO ACTION`);
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE "users" DROP CONSTRAINT "FK_819f4cf5ade23efbae751c9a1fb"`);
    await queryRunner.query(`ALTER TABLE "rolls" DROP CONSTRAINT "FK_7c93a04625a9bc94379054e18e2"`);
    await queryRunner.query(`ALTER TABLE "batches" DROP CONSTRAINT "FK_04f7e14dcf087edadb0f02a95af"`);
    await queryRunner.query(`DROP INDEX "public"."IDX_87968b1601e391e8668f98df94"`);
    await queryRunner.query(`DROP INDEX "public"."IDX_4212da054af063c1d1c3ac8f64"`);
    await queryRunner.query(`DROP INDEX "public"."IDX_60a7b7186e96b938a631a4dcdd"`);
    await queryRunner.query(`DROP TABLE "work_logs"`);
    await queryRunner.query(`DROP INDEX "public"."IDX_97672ac88f789774dd47f7c8be"`);
    await queryRunner.query(`DROP TABLE "users"`);
    await queryRunner.query(`DROP TABLE "uploads"`);
    await queryRunner.query(`DROP INDEX "public"."IDX_5c7928a550939385b13bab8bb8"`);
    await queryRunner.query(`DROP TABLE "trims"`);
    await queryRunner.query(`DROP TABLE "suppliers"`);
    await queryRunner.query(`DROP TABLE "studios"`);
    await queryRunner.query(`DROP INDEX "public"."IDX_50762206f116cd47d1c3fec396"`);
    await queryRunner.query(`DROP TABLE "sessions"`);
    await queryRunner.query(`DROP INDEX "public"."IDX_065051debbc61e0ba44511b7cd"`);
    await queryRunner.query(`DROP TABLE "rolls"`);
    await queryRunner.query(`DROP TABLE "purchase_orders"`);
    await queryRunner.query(`DROP INDEX "public"."IDX_84a12a9110c12ee41ae80cc0f8"`);
    await queryRunner.query(`DROP TABLE "payouts"`);
    await queryRunner.query(`DROP TABLE "pay_periods"`);
    await queryRunner.query(`DROP INDEX "public"."IDX_a5fda10bf6882e27e4fecbc05f"`);
    await queryRunner.query(`DROP TABLE "operations"`);
    await queryRunner.query(`DROP INDEX "public"."IDX_1e9c5c8f14d65bc8bc41926c6f"`);
    await queryRunner.query(`DROP TABLE "markers"`);
    await queryRunner.query(`DROP TABLE "mail_messages"`);
    await queryRunner.query(`DROP INDEX "public"."IDX_fffd4b509d74360d6e7d296286"`);
    await queryRunner.query(`DROP TABLE "lays"`);
    await queryRunner.query(`DROP INDEX "public"."IDX_cbdc2598d7688c754ea5ab588c"`);
    await queryRunner.query(`DROP TABLE "grading_sets"`);
    await queryRunner.query(`DROP TABLE "fabrics"`);
    await queryRunner.query(`DROP TABLE "cut_plans"`);
    await queryRunner.query(`DROP INDEX "public"."IDX_79adc92f9fef7133fad4b9bd3a"`);
    await queryRunner.query(`DROP TABLE "costing_settings"`);
    await queryRunner.query(`DROP INDEX "public"."IDX_d560b96b8168fec10a362ae3aa"`);
    await queryRunner.query(`DROP TABLE "bundles"`);
    await queryRunner.query(`DROP TABLE "batches"`);
    await queryRunner.query(`DROP INDEX "public"."IDX_fa12072b538d463a9b9b541285"`);
    await queryRunner.query(`DROP TABLE "styles"`);
    await queryRunner.query(`DROP INDEX "public"."IDX_dbd6ed6fd46fdf10e397b7dd13"`);
    await queryRunner.query(`DROP TABLE "audit_entries"`);
    await queryRunner.query(`DROP INDEX "public"."IDX_ea57146c900a178d4994c39dcc"`);
    await queryRunner.query(`DROP TABLE "attendance"`);
  }
}
