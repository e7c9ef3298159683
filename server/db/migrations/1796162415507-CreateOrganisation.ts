import type { MigrationInterface, QueryRunner } from 'typeorm';

/** The single organisation row: name, receipt details, units and time zone, demo marker. */
export class CreateOrganisation1796162415507 implements MigrationInterface {
    name = 'CreateOrganisation1796162415507'

    public async up(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`CREATE TABLE "organisation" ("id" smallint NOT NULL DEFAULT '1', "name" character varying(160) NOT NULL, "legal_name" character varying(200) NOT NULL DEFAULT '', "tax_id" character varying(40) NOT NULL DEFAULT '', "contact_email" character varying(254) NOT NULL DEFAULT '', "units" character varying(2) NOT NULL DEFAULT 'ft', "time_zone" character varying(64) NOT NULL DEFAULT 'America/New_York', "is_demo" boolean NOT NULL DEFAULT false, "updated_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), CONSTRAINT "CHK_organisation_single_row" CHECK ("id" = 1), CONSTRAINT "PK_c725ae234ef1b74cce43d2d00c1" PRIMARY KEY ("id"))`);
        await queryRunner.query(`INSERT INTO "organisation" ("id", "name") VALUES (1, 'Restoration program')`);
    }

    public async down(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`DROP TABLE "organisation"`);
    }

}
