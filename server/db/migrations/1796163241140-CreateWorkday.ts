import type { MigrationInterface, QueryRunner } from 'typeorm';

/** Workdays: a site, a time span and a status; drafts come from low-water windows. */
export class CreateWorkday1796163241140 implements MigrationInterface {
    name = 'CreateWorkday1796163241140'

    public async up(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`CREATE TABLE "workday" ("id" uuid NOT NULL DEFAULT gen_random_uuid(), "title" character varying(160) NOT NULL, "kind" character varying(20) NOT NULL DEFAULT 'planting', "site_id" uuid NOT NULL, "starts_at" TIMESTAMP WITH TIME ZONE NOT NULL, "ends_at" TIMESTAMP WITH TIME ZONE NOT NULL, "status" character varying(20) NOT NULL DEFAULT 'draft', "created_by_id" uuid, "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), "updated_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), CONSTRAINT "CHK_workday_span" CHECK ("ends_at" > "starts_at"), CONSTRAINT "CHK_workday_status" CHECK ("status" IN ('draft', 'published', 'cancelled', 'completed')), CONSTRAINT "CHK_workday_kind" CHECK ("kind" IN ('planting', 'nursery', 'monitoring', 'other')), CONSTRAINT "PK_2c3ec5e170006831ea06875ae3d" PRIMARY KEY ("id"))`);
        await queryRunner.query(`CREATE INDEX "IDX_5f64f38b04d728ad39b97989a6" ON "workday"  ("site_id") `);
        await queryRunner.query(`CREATE INDEX "IDX_36da41c0bfa1c7ea205d7e4db9" ON "workday"  ("starts_at") `);
        await queryRunner.query(`ALTER TABLE "workday" ADD CONSTRAINT "FK_5f64f38b04d728ad39b97989a63" FOREIGN KEY ("site_id") REFERENCES "site"("id") ON DELETE RESTRICT ON UPDATE NO ACTION`);
        await queryRunner.query(`ALTER TABLE "workday" ADD CONSTRAINT "FK_091bbf8c2d621c4ac10f5e44cf7" FOREIGN KEY ("created_by_id") REFERENCES "app_user"("id") ON DELETE SET NULL ON UPDATE NO ACTION`);
    }

    public async down(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`ALTER TABLE "workday" DROP CONSTRAINT "FK_091bbf8c2d621c4ac10f5e44cf7"`);
        await queryRunner.query(`ALTER TABLE "workday" DROP CONSTRAINT "FK_5f64f38b04d728ad39b97989a63"`);
        await queryRunner.query(`DROP INDEX "public"."IDX_36da41c0bfa1c7ea205d7e4db9"`);
        await queryRunner.query(`DROP INDEX "public"."IDX_5f64f38b04d728ad39b97989a6"`);
        await queryRunner.query(`DROP TABLE "workday"`);
    }

}
