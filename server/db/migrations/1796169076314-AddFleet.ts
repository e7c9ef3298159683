import type { MigrationInterface, QueryRunner } from 'typeorm';

/** Fleet and trip plans: the organisation's craft, and one stored trip plan per workday. */
export class AddFleet1796169076314 implements MigrationInterface {
    name = 'AddFleet1796169076314'

    public async up(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`CREATE TABLE "craft" ("id" uuid NOT NULL DEFAULT gen_random_uuid(), "name" character varying(80) NOT NULL, "kind" character varying(20) NOT NULL, "seats" integer NOT NULL, "max_load_kg" double precision NOT NULL, "has_capacity_plate" boolean NOT NULL DEFAULT false, "pot_slots" integer NOT NULL DEFAULT '0', "draft_m" double precision, "speed_kmh" double precision NOT NULL, "needs_operator" boolean NOT NULL DEFAULT false, "active" boolean NOT NULL DEFAULT true, "notes" text NOT NULL DEFAULT '', "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), "updated_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), CONSTRAINT "UQ_193a6353339823bec0c2470a025" UNIQUE ("name"), CONSTRAINT "CHK_craft_limits" CHECK ("seats" >= 1 AND "max_load_kg" > 0 AND "pot_slots" >= 0 AND "speed_kmh" > 0), CONSTRAINT "CHK_craft_kind" CHECK ("kind" IN ('sit-on-top-kayak', 'tandem-kayak', 'canoe', 'skiff', 'other')), CONSTRAINT "PK_c17b1c02b2fcac4aafe3bf0b7f3" PRIMARY KEY ("id"))`);
        await queryRunner.query(`CREATE TABLE "trip_plan" ("workday_id" uuid NOT NULL, "instance" jsonb NOT NULL, "plan" jsonb NOT NULL, "source" character varying(10) NOT NULL DEFAULT 'solver', "updated_by_id" uuid, "updated_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), CONSTRAINT "PK_7d09e751dc855e2e94c7d0fa23d" PRIMARY KEY ("workday_id"))`);
        await queryRunner.query(`ALTER TABLE "trip_plan" ADD CONSTRAINT "FK_7d09e751dc855e2e94c7d0fa23d" FOREIGN KEY ("workday_id") REFERENCES "workday"("id") ON DELETE CASCADE ON UPDATE NO ACTION`);
    }

    public async down(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`ALTER TABLE "trip_plan" DROP CONSTRAINT "FK_7d09e751dc855e2e94c7d0fa23d"`);
        await queryRunner.query(`DROP TABLE "trip_plan"`);
        await queryRunner.query(`DROP TABLE "craft"`);
    }

}
