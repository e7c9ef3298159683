import type { MigrationInterface, QueryRunner } from 'typeorm';

/** Accounts with roles, one-time link tokens, and the session table that connect-pg-simple reads. */
export class CreateUserAndAuthToken1796161902518 implements MigrationInterface {
    name = 'CreateUserAndAuthToken1796161902518'

    public async up(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`CREATE TABLE "app_user" ("id" uuid NOT NULL DEFAULT gen_random_uuid(), "email" character varying(254) NOT NULL, "name" character varying(120) NOT NULL, "password_hash" character varying(300), "role" character varying(20) NOT NULL DEFAULT 'volunteer', "google_id" character varying(64), "email_verified_at" TIMESTAMP WITH TIME ZONE, "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), "updated_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), CONSTRAINT "UQ_3fa909d0e37c531ebc237703391" UNIQUE ("email"), CONSTRAINT "UQ_364ac50e1f381764782379f936f" UNIQUE ("google_id"), CONSTRAINT "PK_22a5c4a3d9b2fb8e4e73fc4ada1" PRIMARY KEY ("id"))`);
        await queryRunner.query(`CREATE TABLE "auth_token" ("id" uuid NOT NULL DEFAULT gen_random_uuid(), "user_id" uuid NOT NULL, "purpose" character varying(32) NOT NULL, "token_hash" character(64) NOT NULL, "expires_at" TIMESTAMP WITH TIME ZONE NOT NULL, "used_at" TIMESTAMP WITH TIME ZONE, "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), CONSTRAINT "UQ_bf636362c6d210728e4539630ba" UNIQUE ("token_hash"), CONSTRAINT "PK_4572ff5d1264c4a523f01aa86a0" PRIMARY KEY ("id"))`);
        await queryRunner.query(`CREATE INDEX "IDX_26b580c89e141c75426f44317b" ON "auth_token"  ("user_id") `);
        await queryRunner.query(`ALTER TABLE "auth_token" ADD CONSTRAINT "FK_26b580c89e141c75426f44317bc" FOREIGN KEY ("user_id") REFERENCES "app_user"("id") ON DELETE CASCADE ON UPDATE NO ACTION`);
        await queryRunner.query(`ALTER TABLE "app_user" ADD CONSTRAINT "CHK_app_user_role" CHECK ("role" IN ('volunteer', 'coordinator', 'admin'))`);
        // Shape required by connect-pg-simple (its table.sql); sessions live in PostgreSQL so instances stay stateless.
        await queryRunner.query(`CREATE TABLE "session" ("sid" varchar NOT NULL COLLATE "default", "sess" json NOT NULL, "expire" timestamp(6) NOT NULL, CONSTRAINT "session_pkey" PRIMARY KEY ("sid"))`);
        await queryRunner.query(`CREATE INDEX "IDX_session_expire" ON "session" ("expire")`);
    }

    public async down(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`DROP TABLE "session"`);
        await queryRunner.query(`ALTER TABLE "auth_token" DROP CONSTRAINT "FK_26b580c89e141c75426f44317bc"`);
        await queryRunner.query(`DROP INDEX "public"."IDX_26b580c89e141c75426f44317b"`);
        await queryRunner.query(`DROP TABLE "auth_token"`);
        await queryRunner.query(`DROP TABLE "app_user"`);
    }

}
