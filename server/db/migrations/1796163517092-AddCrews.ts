import type { MigrationInterface, QueryRunner } from 'typeorm';

/** Crews: workday details and role caps, sign-ups with waivers and check-in, volunteer profiles, waiver versions, audit log, mail outbox. */
export class AddCrews1796163517092 implements MigrationInterface {
    name = 'AddCrews1796163517092'

    public async up(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`CREATE TABLE "workday_role" ("workday_id" uuid NOT NULL, "role" character varying(20) NOT NULL, "capacity" integer NOT NULL, CONSTRAINT "CHK_workday_role_capacity" CHECK ("capacity" >= 0), CONSTRAINT "PK_a921a8689b4b47866ac2f981a10" PRIMARY KEY ("workday_id", "role"))`);
        await queryRunner.query(`CREATE TABLE "signup" ("id" uuid NOT NULL DEFAULT gen_random_uuid(), "workday_id" uuid NOT NULL, "user_id" uuid NOT NULL, "role" character varying(20) NOT NULL, "status" character varying(20) NOT NULL, "queued_at" TIMESTAMP WITH TIME ZONE NOT NULL, "waiver_version" integer NOT NULL, "waiver_signed_name" character varying(120) NOT NULL, "waiver_signed_at" TIMESTAMP WITH TIME ZONE NOT NULL, "is_minor" boolean NOT NULL DEFAULT false, "guardian_user_id" uuid, "guardian" jsonb, "own_craft" jsonb, "operator_qualification" character varying(300) NOT NULL DEFAULT '', "note" character varying(500) NOT NULL DEFAULT '', "checked_in_at" TIMESTAMP WITH TIME ZONE, "checked_out_at" TIMESTAMP WITH TIME ZONE, "no_show" boolean NOT NULL DEFAULT false, "minutes_override" integer, "cancelled_at" TIMESTAMP WITH TIME ZONE, "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), "updated_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), CONSTRAINT "PK_ac9abc3369438f36bac2e0986e2" PRIMARY KEY ("id"))`);
        await queryRunner.query(`CREATE INDEX "IDX_1ff9822af876584ba3e0cb54a4" ON "signup"  ("user_id") `);
        await queryRunner.query(`CREATE INDEX "IDX_signup_workday_status" ON "signup"  ("workday_id", "status") `);
        await queryRunner.query(`CREATE UNIQUE INDEX "UQ_signup_live_person" ON "signup"  ("workday_id", "user_id") WHERE "status" <> 'cancelled'`);
        await queryRunner.query(`CREATE TABLE "volunteer_profile" ("user_id" uuid NOT NULL, "date_of_birth" date, "phone" character varying(40), "emergency_contact" jsonb, "skills" jsonb NOT NULL DEFAULT '[]', "weight_kg" double precision, "reminders_opt_out" boolean NOT NULL DEFAULT false, "calendar_token" character varying(64), "updated_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), CONSTRAINT "UQ_06fc42f508511ccc1697bf56fdd" UNIQUE ("calendar_token"), CONSTRAINT "PK_cfafe8408513320df9f5215ab78" PRIMARY KEY ("user_id"))`);
        await queryRunner.query(`CREATE TABLE "waiver_version" ("version" integer NOT NULL, "text" text NOT NULL, "guardian_text" text NOT NULL DEFAULT '', "created_by_id" uuid, "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), CONSTRAINT "PK_53935ef5003e3744c0877703665" PRIMARY KEY ("version"))`);
        await queryRunner.query(`CREATE TABLE "audit_log" ("id" uuid NOT NULL DEFAULT gen_random_uuid(), "actor_id" uuid, "action" character varying(60) NOT NULL, "entity_type" character varying(40) NOT NULL, "entity_id" uuid, "before" jsonb, "after" jsonb, "reason" character varying(500) NOT NULL DEFAULT '', "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), CONSTRAINT "PK_07fefa57f7f5ab8fc3f52b3ed0b" PRIMARY KEY ("id"))`);
        await queryRunner.query(`CREATE INDEX "IDX_2cbcf87a54ac23c6294ada82ee" ON "audit_log"  ("entity_type") `);
        await queryRunner.query(`CREATE INDEX "IDX_c6c5d74b38ecfe778182348e7c" ON "audit_log"  ("entity_id") `);
        await queryRunner.query(`CREATE INDEX "IDX_2ad7930a7c2af80585c8c1b770" ON "audit_log"  ("created_at") `);
        await queryRunner.query(`CREATE TABLE "outbox_message" ("id" uuid NOT NULL DEFAULT gen_random_uuid(), "kind" character varying(40) NOT NULL, "to_address" character varying(254) NOT NULL, "subject" character varying(300) NOT NULL, "text" text NOT NULL, "html" text NOT NULL DEFAULT '', "attachments" jsonb NOT NULL DEFAULT '[]', "dedupe_key" character varying(200), "status" character varying(10) NOT NULL DEFAULT 'pending', "attempts" integer NOT NULL DEFAULT '0', "last_error" text NOT NULL DEFAULT '', "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), "sent_at" TIMESTAMP WITH TIME ZONE, CONSTRAINT "UQ_c9d3ed272e281eeb8be7353e2cd" UNIQUE ("dedupe_key"), CONSTRAINT "PK_2f36ee5236f2793f3e7bd554589" PRIMARY KEY ("id"))`);
        await queryRunner.query(`CREATE INDEX "IDX_2b7077b71347613fa48fadd916" ON "outbox_message"  ("status") `);
        await queryRunner.query(`ALTER TABLE "workday" ADD "description" text NOT NULL DEFAULT ''`);
        await queryRunner.query(`ALTER TABLE "workday" ADD "meeting_point" character varying(200) NOT NULL DEFAULT ''`);
        await queryRunner.query(`ALTER TABLE "workday" ADD "what_to_bring" text NOT NULL DEFAULT ''`);
        await queryRunner.query(`ALTER TABLE "workday" ADD "minimum_age" integer NOT NULL DEFAULT '0'`);
        await queryRunner.query(`ALTER TABLE "workday" ADD "capacity" integer NOT NULL DEFAULT '12'`);
        await queryRunner.query(`ALTER TABLE "workday" ADD "sequence" integer NOT NULL DEFAULT '0'`);
        await queryRunner.query(`ALTER TABLE "workday" ADD "cancel_message" text NOT NULL DEFAULT ''`);
        await queryRunner.query(`ALTER TABLE "workday" ADD "published_at" TIMESTAMP WITH TIME ZONE`);
        await queryRunner.query(`ALTER TABLE "workday_role" ADD CONSTRAINT "FK_fca084be323726c0d839b302d4b" FOREIGN KEY ("workday_id") REFERENCES "workday"("id") ON DELETE CASCADE ON UPDATE NO ACTION`);
        await queryRunner.query(`ALTER TABLE "signup" ADD CONSTRAINT "FK_86457224d57ff7ce1219b080d81" FOREIGN KEY ("workday_id") REFERENCES "workday"("id") ON DELETE CASCADE ON UPDATE NO ACTION`);
        await queryRunner.query(`ALTER TABLE "signup" ADD CONSTRAINT "FK_1ff9822af876584ba3e0cb54a42" FOREIGN KEY ("user_id") REFERENCES "app_user"("id") ON DELETE CASCADE ON UPDATE NO ACTION`);
        await queryRunner.query(`ALTER TABLE "volunteer_profile" ADD CONSTRAINT "FK_cfafe8408513320df9f5215ab78" FOREIGN KEY ("user_id") REFERENCES "app_user"("id") ON DELETE CASCADE ON UPDATE NO ACTION`);
        await queryRunner.query(`INSERT INTO "waiver_version" ("version", "text", "guardian_text") VALUES (1, 'I am taking part, as a volunteer, in mangrove restoration work organised by this organisation. The work can include wading on tidal flats with soft mud and sharp oyster shell, paddling or riding in small boats, lifting heavy planting pots, and working in sun, heat and changing weather.
I understand these activities carry risks of injury, illness or loss of property that care cannot remove entirely. I take part by my own choice and accept those risks.
I will wear a life jacket whenever I am on the water, follow the instructions of the workday lead and of any boat operator, tell the lead about any condition that affects my safety, and stop and leave the water when told to or when I feel unsafe.
I release the organisation, its staff and volunteers from claims for injury or loss arising from the ordinary risks of these activities, to the extent the law allows.
I agree that photos taken during the workday may be used by the organisation unless I say otherwise to the workday lead.', 'I am the parent or legal guardian of the minor named on this sign-up. I have read the waiver above, I agree to it on the minor''s behalf and on my own, and I confirm the minor may take part in the activities described.')`);
    }

    public async down(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`ALTER TABLE "volunteer_profile" DROP CONSTRAINT "FK_cfafe8408513320df9f5215ab78"`);
        await queryRunner.query(`ALTER TABLE "signup" DROP CONSTRAINT "FK_1ff9822af876584ba3e0cb54a42"`);
        await queryRunner.query(`ALTER TABLE "signup" DROP CONSTRAINT "FK_86457224d57ff7ce1219b080d81"`);
        await queryRunner.query(`ALTER TABLE "workday_role" DROP CONSTRAINT "FK_fca084be323726c0d839b302d4b"`);
        await queryRunner.query(`ALTER TABLE "workday" DROP COLUMN "published_at"`);
        await queryRunner.query(`ALTER TABLE "workday" DROP COLUMN "cancel_message"`);
        await queryRunner.query(`ALTER TABLE "workday" DROP COLUMN "sequence"`);
        await queryRunner.query(`ALTER TABLE "workday" DROP COLUMN "capacity"`);
        await queryRunner.query(`ALTER TABLE "workday" DROP COLUMN "minimum_age"`);
        await queryRunner.query(`ALTER TABLE "workday" DROP COLUMN "what_to_bring"`);
        await queryRunner.query(`ALTER TABLE "workday" DROP COLUMN "meeting_point"`);
        await queryRunner.query(`ALTER TABLE "workday" DROP COLUMN "description"`);
        await queryRunner.query(`DROP INDEX "public"."IDX_2b7077b71347613fa48fadd916"`);
        await queryRunner.query(`DROP TABLE "outbox_message"`);
        await queryRunner.query(`DROP INDEX "public"."IDX_2ad7930a7c2af80585c8c1b770"`);
        await queryRunner.query(`DROP INDEX "public"."IDX_c6c5d74b38ecfe778182348e7c"`);
        await queryRunner.query(`DROP INDEX "public"."IDX_2cbcf87a54ac23c6294ada82ee"`);
        await queryRunner.query(`DROP TABLE "audit_log"`);
        await queryRunner.query(`DROP TABLE "waiver_version"`);
        await queryRunner.query(`DROP TABLE "volunteer_profile"`);
        await queryRunner.query(`DROP INDEX "public"."UQ_signup_live_person"`);
        await queryRunner.query(`DROP INDEX "public"."IDX_signup_workday_status"`);
        await queryRunner.query(`DROP INDEX "public"."IDX_1ff9822af876584ba3e0cb54a4"`);
        await queryRunner.query(`DROP TABLE "signup"`);
        await queryRunner.query(`DROP TABLE "workday_role"`);
    }

}
