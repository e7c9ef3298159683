import type { MigrationInterface, QueryRunner } from 'typeorm';

/** Nursery ledger: collection batches, tanks and salinity readings, trees with their history, photos, readiness rules. */
export class AddNursery1796165257564 implements MigrationInterface {
    name = 'AddNursery1796165257564'

    public async up(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`CREATE TABLE "photo" ("id" uuid NOT NULL DEFAULT gen_random_uuid(), "stored_name" character varying(80) NOT NULL, "mime_type" character varying(40) NOT NULL, "size_bytes" integer NOT NULL, "uploaded_by_id" uuid, "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), CONSTRAINT "UQ_710a9eb7711081471db8038cbcc" UNIQUE ("stored_name"), CONSTRAINT "PK_723fa50bf70dcfd06fb5a44d4ff" PRIMARY KEY ("id"))`);
        await queryRunner.query(`CREATE TABLE "collection_batch" ("id" uuid NOT NULL DEFAULT gen_random_uuid(), "code" character varying(40) NOT NULL, "collected_on" date NOT NULL, "place" character varying(300) NOT NULL, "latitude" double precision, "longitude" double precision, "collector" character varying(120) NOT NULL DEFAULT '', "count" integer NOT NULL, "notes" text NOT NULL DEFAULT '', "photo_id" uuid, "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), CONSTRAINT "UQ_987404fbe0a709c7fa813a29aea" UNIQUE ("code"), CONSTRAINT "PK_1f36a30ecd3965860a3c0280c3d" PRIMARY KEY ("id"))`);
        await queryRunner.query(`CREATE TABLE "tank" ("id" uuid NOT NULL DEFAULT gen_random_uuid(), "name" character varying(80) NOT NULL, "volume_litres" double precision NOT NULL, "target_site_id" uuid, "notes" text NOT NULL DEFAULT '', "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), CONSTRAINT "UQ_136c64cd1d84a30090d5099a10b" UNIQUE ("name"), CONSTRAINT "PK_7c34d00328207090cdf572bb15a" PRIMARY KEY ("id"))`);
        await queryRunner.query(`CREATE TABLE "salinity_reading" ("id" uuid NOT NULL DEFAULT gen_random_uuid(), "tank_id" uuid NOT NULL, "taken_at" TIMESTAMP WITH TIME ZONE NOT NULL, "method" character varying(20) NOT NULL, "salinity_ppt" double precision NOT NULL, "specific_gravity" double precision, "temperature_c" double precision, "taken_by_id" uuid, "note" character varying(300) NOT NULL DEFAULT '', "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), CONSTRAINT "PK_097fb69ba67476bcd74e6e1512f" PRIMARY KEY ("id"))`);
        await queryRunner.query(`CREATE INDEX "IDX_salinity_reading_tank_time" ON "salinity_reading"  ("tank_id", "taken_at") `);
        await queryRunner.query(`CREATE TABLE "tree" ("id" uuid NOT NULL DEFAULT gen_random_uuid(), "tag" character varying(20) NOT NULL, "batch_id" uuid, "stage" character varying(12) NOT NULL DEFAULT 'collected', "tank_id" uuid, "pot_height_cm" double precision, "pot_mass_kg" double precision, "height_cm" double precision, "leaf_count" integer, "healthy" boolean NOT NULL DEFAULT true, "reserved_workday_id" uuid, "site_id" uuid, "planted_on" date, "photo_id" uuid, "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), "updated_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), CONSTRAINT "UQ_613eb7029c7fed0f2a54c48402d" UNIQUE ("tag"), CONSTRAINT "PK_5d87d89552132eac0a897623064" PRIMARY KEY ("id"))`);
        await queryRunner.query(`CREATE INDEX "IDX_0e41166b98f4e1b134387f309f" ON "tree"  ("batch_id") `);
        await queryRunner.query(`CREATE INDEX "IDX_21f60ee3bb6feaafb1246c5a5f" ON "tree"  ("stage") `);
        await queryRunner.query(`CREATE INDEX "IDX_4164b4a1b28e184ebec30e5b8f" ON "tree"  ("tank_id") `);
        await queryRunner.query(`CREATE INDEX "IDX_c0d6df173a92dcb785533b726e" ON "tree"  ("reserved_workday_id") `);
        await queryRunner.query(`CREATE INDEX "IDX_6922c313040da944419c8a6a18" ON "tree"  ("site_id") `);
        await queryRunner.query(`CREATE TABLE "tree_event" ("id" uuid NOT NULL DEFAULT gen_random_uuid(), "tree_id" uuid NOT NULL, "kind" character varying(12) NOT NULL, "at" TIMESTAMP WITH TIME ZONE NOT NULL, "by_id" uuid, "from_stage" character varying(12), "to_stage" character varying(12), "tank_id" uuid, "height_cm" double precision, "leaf_count" integer, "healthy" boolean, "note" character varying(500) NOT NULL DEFAULT '', "photo_id" uuid, "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), CONSTRAINT "PK_618094e31acadfe9d3747f7380b" PRIMARY KEY ("id"))`);
        await queryRunner.query(`CREATE INDEX "IDX_tree_event_tree_time" ON "tree_event"  ("tree_id", "at") `);
        await queryRunner.query(`ALTER TABLE "organisation" ADD "nursery_rules" jsonb NOT NULL DEFAULT '{"holdDays": 21, "crownRule": "mhhw", "salinityTolerancePpt": 2, "maxCrownSubmergedShare": 0.02}'`);
        await queryRunner.query(`ALTER TABLE "salinity_reading" ADD CONSTRAINT "FK_d549e4ee150a62ce86fd83382de" FOREIGN KEY ("tank_id") REFERENCES "tank"("id") ON DELETE CASCADE ON UPDATE NO ACTION`);
        await queryRunner.query(`ALTER TABLE "tree" ADD CONSTRAINT "FK_0e41166b98f4e1b134387f309f0" FOREIGN KEY ("batch_id") REFERENCES "collection_batch"("id") ON DELETE SET NULL ON UPDATE NO ACTION`);
        await queryRunner.query(`ALTER TABLE "tree" ADD CONSTRAINT "FK_4164b4a1b28e184ebec30e5b8fd" FOREIGN KEY ("tank_id") REFERENCES "tank"("id") ON DELETE SET NULL ON UPDATE NO ACTION`);
        await queryRunner.query(`ALTER TABLE "tree" ADD CONSTRAINT "FK_c0d6df173a92dcb785533b726e9" FOREIGN KEY ("reserved_workday_id") REFERENCES "workday"("id") ON DELETE SET NULL ON UPDATE NO ACTION`);
        await queryRunner.query(`ALTER TABLE "tree" ADD CONSTRAINT "FK_6922c313040da944419c8a6a180" FOREIGN KEY ("site_id") REFERENCES "site"("id") ON DELETE RESTRICT ON UPDATE NO ACTION`);
        await queryRunner.query(`ALTER TABLE "tree_event" ADD CONSTRAINT "FK_0f6eb3a7c9d317d578becfe11dd" FOREIGN KEY ("tree_id") REFERENCES "tree"("id") ON DELETE CASCADE ON UPDATE NO ACTION`);
    }

    public async down(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`ALTER TABLE "tree_event" DROP CONSTRAINT "FK_0f6eb3a7c9d317d578becfe11dd"`);
        await queryRunner.query(`ALTER TABLE "tree" DROP CONSTRAINT "FK_6922c313040da944419c8a6a180"`);
        await queryRunner.query(`ALTER TABLE "tree" DROP CONSTRAINT "FK_c0d6df173a92dcb785533b726e9"`);
        await queryRunner.query(`ALTER TABLE "tree" DROP CONSTRAINT "FK_4164b4a1b28e184ebec30e5b8fd"`);
        await queryRunner.query(`ALTER TABLE "tree" DROP CONSTRAINT "FK_0e41166b98f4e1b134387f309f0"`);
        await queryRunner.query(`ALTER TABLE "salinity_reading" DROP CONSTRAINT "FK_d549e4ee150a62ce86fd83382de"`);
        await queryRunner.query(`ALTER TABLE "organisation" DROP COLUMN "nursery_rules"`);
        await queryRunner.query(`DROP INDEX "public"."IDX_tree_event_tree_time"`);
        await queryRunner.query(`DROP TABLE "tree_event"`);
        await queryRunner.query(`DROP INDEX "public"."IDX_6922c313040da944419c8a6a18"`);
        await queryRunner.query(`DROP INDEX "public"."IDX_c0d6df173a92dcb785533b726e"`);
        await queryRunner.query(`DROP INDEX "public"."IDX_4164b4a1b28e184ebec30e5b8f"`);
        await queryRunner.query(`DROP INDEX "public"."IDX_21f60ee3bb6feaafb1246c5a5f"`);
        await queryRunner.query(`DROP INDEX "public"."IDX_0e41166b98f4e1b134387f309f"`);
        await queryRunner.query(`DROP TABLE "tree"`);
        await queryRunner.query(`DROP INDEX "public"."IDX_salinity_reading_tank_time"`);
        await queryRunner.query(`DROP TABLE "salinity_reading"`);
        await queryRunner.query(`DROP TABLE "tank"`);
        await queryRunner.query(`DROP TABLE "collection_batch"`);
        await queryRunner.query(`DROP TABLE "photo"`);
    }

}
