import type { MigrationInterface, QueryRunner } from 'typeorm';

/** Sponsor a tree (campaigns, donations, handled webhook events), outcomes (monitoring visits, tree checks, planting records) and the trip, giving and report settings. */
export class AddGivingAndOutcomes1796170127221 implements MigrationInterface {
    name = 'AddGivingAndOutcomes1796170127221'

    public async up(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`CREATE TABLE "campaign" ("id" uuid NOT NULL DEFAULT gen_random_uuid(), "name" character varying(120) NOT NULL, "story" text NOT NULL DEFAULT '', "price_cents" integer NOT NULL, "goal_trees" integer NOT NULL, "starts_on" date NOT NULL, "ends_on" date, "active" boolean NOT NULL DEFAULT true, "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), "updated_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), CONSTRAINT "CHK_campaign_amounts" CHECK ("price_cents" > 0 AND "goal_trees" > 0), CONSTRAINT "PK_0ce34d26e7f2eb316a3a592cdc4" PRIMARY KEY ("id"))`);
        await queryRunner.query(`CREATE TABLE "donation" ("id" uuid NOT NULL DEFAULT gen_random_uuid(), "campaign_id" uuid, "checkout_session_id" character varying(255) NOT NULL, "payment_intent_id" character varying(255), "amount_cents" integer NOT NULL, "gift_cents" integer NOT NULL, "fee_cover_cents" integer NOT NULL DEFAULT '0', "currency" character varying(3) NOT NULL DEFAULT 'usd', "status" character varying(10) NOT NULL DEFAULT 'paid', "tree_count" integer NOT NULL DEFAULT '0', "donor_name" character varying(120) NOT NULL, "donor_email" character varying(254) NOT NULL, "wall_name" character varying(80), "wants_updates" boolean NOT NULL DEFAULT false, "dedication_kind" character varying(8), "dedication_name" character varying(120), "paid_at" TIMESTAMP WITH TIME ZONE NOT NULL, "refunded_at" TIMESTAMP WITH TIME ZONE, "receipt_sent_at" TIMESTAMP WITH TIME ZONE, "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), CONSTRAINT "UQ_1220ceb840e5f51ff6914e1634a" UNIQUE ("checkout_session_id"), CONSTRAINT "CHK_donation_status" CHECK ("status" IN ('paid', 'refunded')), CONSTRAINT "CHK_donation_amounts" CHECK ("amount_cents" > 0 AND "gift_cents" > 0 AND "fee_cover_cents" >= 0 AND "tree_count" >= 0), CONSTRAINT "PK_25fb5a541964bc5cfc18fb13a82" PRIMARY KEY ("id"))`);
        await queryRunner.query(`CREATE INDEX "IDX_f1e3d70dd965518f5f3374d199" ON "donation"  ("campaign_id") `);
        await queryRunner.query(`CREATE INDEX "IDX_7304bfb6f7762436dca747a557" ON "donation"  ("payment_intent_id") `);
        await queryRunner.query(`CREATE INDEX "IDX_478bca366c2fef1fb70317b680" ON "donation"  ("status") `);
        await queryRunner.query(`CREATE INDEX "IDX_2007ddf39c6a9acf158c6c7a31" ON "donation"  ("donor_email") `);
        await queryRunner.query(`CREATE TABLE "webhook_event" ("id" character varying(255) NOT NULL, "type" character varying(80) NOT NULL, "received_at" TIMESTAMP WITH TIME ZONE NOT NULL, CONSTRAINT "PK_0f56d2f40f5ec823acf8e8edad1" PRIMARY KEY ("id"))`);
        await queryRunner.query(`CREATE TABLE "monitoring_visit" ("id" uuid NOT NULL DEFAULT gen_random_uuid(), "site_id" uuid NOT NULL, "workday_id" uuid, "visited_on" date NOT NULL, "notes" text NOT NULL DEFAULT '', "created_by_id" uuid, "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), CONSTRAINT "PK_0830875a12ba8db25fd22d637a9" PRIMARY KEY ("id"))`);
        await queryRunner.query(`CREATE INDEX "IDX_2d46bb12845b3466047155c7ed" ON "monitoring_visit"  ("site_id") `);
        await queryRunner.query(`CREATE INDEX "IDX_47e6ba596d40e2a21f53f914a3" ON "monitoring_visit"  ("workday_id") `);
        await queryRunner.query(`CREATE TABLE "tree_check" ("id" uuid NOT NULL DEFAULT gen_random_uuid(), "visit_id" uuid NOT NULL, "tree_id" uuid NOT NULL, "condition" character varying(8) NOT NULL, "height_cm" double precision, "notes" text NOT NULL DEFAULT '', "photo_id" uuid, "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), CONSTRAINT "UQ_tree_check_visit_tree" UNIQUE ("visit_id", "tree_id"), CONSTRAINT "CHK_tree_check_condition" CHECK ("condition" IN ('alive', 'lost', 'missing')), CONSTRAINT "PK_a57f2ddf075ef1e039e242c3d0b" PRIMARY KEY ("id"))`);
        await queryRunner.query(`CREATE INDEX "IDX_385861a2cefcccf80d75ce1e31" ON "tree_check"  ("tree_id") `);
        await queryRunner.query(`ALTER TABLE "organisation" ADD "trip_rules" jsonb NOT NULL DEFAULT '{"potMassKg": 27, "loadMinutes": 10, "platedMargin": 1, "unloadMinutes": 5, "standardPersonKg": 84, "paddlecraftMargin": 0.7, "plantingMinutesPerTree": 20}'`);
        await queryRunner.query(`ALTER TABLE "organisation" ADD "currency" character varying(3) NOT NULL DEFAULT 'usd'`);
        await queryRunner.query(`ALTER TABLE "organisation" ADD "giving_rules" jsonb NOT NULL DEFAULT '{"cardFeePercent": 2.9, "cardFeeFixedCents": 30}'`);
        await queryRunner.query(`ALTER TABLE "organisation" ADD "volunteer_hour_value_cents" integer NOT NULL DEFAULT '3180'`);
        await queryRunner.query(`ALTER TABLE "organisation" ADD "volunteer_hour_value_source" character varying(200) NOT NULL DEFAULT 'Independent Sector, national value of a volunteer hour, 2022'`);
        await queryRunner.query(`ALTER TABLE "tree" ADD "planted_bed_elevation_m" double precision`);
        await queryRunner.query(`ALTER TABLE "tree" ADD "planted_workday_id" uuid`);
        await queryRunner.query(`ALTER TABLE "tree" ADD "sponsor_donation_id" uuid`);
        await queryRunner.query(`ALTER TABLE "tree" ADD "sponsor_told_planted_at" TIMESTAMP WITH TIME ZONE`);
        await queryRunner.query(`CREATE INDEX "IDX_fab984b29849d739c7f4e785fd" ON "tree"  ("planted_workday_id") `);
        await queryRunner.query(`CREATE INDEX "IDX_b2e803169c9c7353bf6f017278" ON "tree"  ("sponsor_donation_id") `);
        await queryRunner.query(`ALTER TABLE "donation" ADD CONSTRAINT "FK_f1e3d70dd965518f5f3374d1999" FOREIGN KEY ("campaign_id") REFERENCES "campaign"("id") ON DELETE SET NULL ON UPDATE NO ACTION`);
        await queryRunner.query(`ALTER TABLE "tree" ADD CONSTRAINT "FK_fab984b29849d739c7f4e785fd9" FOREIGN KEY ("planted_workday_id") REFERENCES "workday"("id") ON DELETE SET NULL ON UPDATE NO ACTION`);
        await queryRunner.query(`ALTER TABLE "tree" ADD CONSTRAINT "FK_b2e803169c9c7353bf6f017278d" FOREIGN KEY ("sponsor_donation_id") REFERENCES "donation"("id") ON DELETE SET NULL ON UPDATE NO ACTION`);
        await queryRunner.query(`ALTER TABLE "monitoring_visit" ADD CONSTRAINT "FK_2d46bb12845b3466047155c7ed6" FOREIGN KEY ("site_id") REFERENCES "site"("id") ON DELETE RESTRICT ON UPDATE NO ACTION`);
        await queryRunner.query(`ALTER TABLE "monitoring_visit" ADD CONSTRAINT "FK_47e6ba596d40e2a21f53f914a34" FOREIGN KEY ("workday_id") REFERENCES "workday"("id") ON DELETE SET NULL ON UPDATE NO ACTION`);
        await queryRunner.query(`ALTER TABLE "tree_check" ADD CONSTRAINT "FK_d167c1298cd21e8a255d0404b3a" FOREIGN KEY ("visit_id") REFERENCES "monitoring_visit"("id") ON DELETE CASCADE ON UPDATE NO ACTION`);
        await queryRunner.query(`ALTER TABLE "tree_check" ADD CONSTRAINT "FK_385861a2cefcccf80d75ce1e31f" FOREIGN KEY ("tree_id") REFERENCES "tree"("id") ON DELETE CASCADE ON UPDATE NO ACTION`);
    }

    public async down(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`ALTER TABLE "tree_check" DROP CONSTRAINT "FK_385861a2cefcccf80d75ce1e31f"`);
        await queryRunner.query(`ALTER TABLE "tree_check" DROP CONSTRAINT "FK_d167c1298cd21e8a255d0404b3a"`);
        await queryRunner.query(`ALTER TABLE "monitoring_visit" DROP CONSTRAINT "FK_47e6ba596d40e2a21f53f914a34"`);
        await queryRunner.query(`ALTER TABLE "monitoring_visit" DROP CONSTRAINT "FK_2d46bb12845b3466047155c7ed6"`);
        await queryRunner.query(`ALTER TABLE "tree" DROP CONSTRAINT "FK_b2e803169c9c7353bf6f017278d"`);
        await queryRunner.query(`ALTER TABLE "tree" DROP CONSTRAINT "FK_fab984b29849d739c7f4e785fd9"`);
        await queryRunner.query(`ALTER TABLE "donation" DROP CONSTRAINT "FK_f1e3d70dd965518f5f3374d1999"`);
        await queryRunner.query(`DROP INDEX "public"."IDX_b2e803169c9c7353bf6f017278"`);
        await queryRunner.query(`DROP INDEX "public"."IDX_fab984b29849d739c7f4e785fd"`);
        await queryRunner.query(`ALTER TABLE "tree" DROP COLUMN "sponsor_told_planted_at"`);
        await queryRunner.query(`ALTER TABLE "tree" DROP COLUMN "sponsor_donation_id"`);
        await queryRunner.query(`ALTER TABLE "tree" DROP COLUMN "planted_workday_id"`);
        await queryRunner.query(`ALTER TABLE "tree" DROP COLUMN "planted_bed_elevation_m"`);
        await queryRunner.query(`ALTER TABLE "organisation" DROP COLUMN "volunteer_hour_value_source"`);
        await queryRunner.query(`ALTER TABLE "organisation" DROP COLUMN "volunteer_hour_value_cents"`);
        await queryRunner.query(`ALTER TABLE "organisation" DROP COLUMN "giving_rules"`);
        await queryRunner.query(`ALTER TABLE "organisation" DROP COLUMN "currency"`);
        await queryRunner.query(`ALTER TABLE "organisation" DROP COLUMN "trip_rules"`);
        await queryRunner.query(`DROP INDEX "public"."IDX_385861a2cefcccf80d75ce1e31"`);
        await queryRunner.query(`DROP TABLE "tree_check"`);
        await queryRunner.query(`DROP INDEX "public"."IDX_47e6ba596d40e2a21f53f914a3"`);
        await queryRunner.query(`DROP INDEX "public"."IDX_2d46bb12845b3466047155c7ed"`);
        await queryRunner.query(`DROP TABLE "monitoring_visit"`);
        await queryRunner.query(`DROP TABLE "webhook_event"`);
        await queryRunner.query(`DROP INDEX "public"."IDX_2007ddf39c6a9acf158c6c7a31"`);
        await queryRunner.query(`DROP INDEX "public"."IDX_478bca366c2fef1fb70317b680"`);
        await queryRunner.query(`DROP INDEX "public"."IDX_7304bfb6f7762436dca747a557"`);
        await queryRunner.query(`DROP INDEX "public"."IDX_f1e3d70dd965518f5f3374d199"`);
        await queryRunner.query(`DROP TABLE "donation"`);
        await queryRunner.query(`DROP TABLE "campaign"`);
    }

}
