import type { MigrationInterface, QueryRunner } from 'typeorm';

export class OrderReceiptKeys1796443579000 implements MigrationInterface {
  name = 'OrderReceiptKeys1796443579000';

  public async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE "purchase_orders" ADD "revision" integer NOT NULL DEFAULT '0'`);
    await queryRunner.query(`ALTER TABLE "purchase_orders" ADD "receiptKeys" text`);
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE "purchase_orders" DROP COLUMN "receiptKeys"`);
    await queryRunner.query(`ALTER TABLE "purchase_orders" DROP COLUMN "revision"`);
  }
}
