import type { MigrationInterface, QueryRunner } from 'typeorm';

/** Planting sites: coordinates, tide station, bed and route elevations, working limits. */
export class CreateSite1796162470126 implements MigrationInterface {
    name = 'CreateSite1796162470126'

    public async up(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`CREATE TABLE "site" ("id" uuid NOT NULL DEFAULT gen_random_uuid(), "name" character varying(120) NOT NULL, "latitude" numeric(9,6) NOT NULL, "longitude" numeric(9,6) NOT NULL, "time_zone" character varying(64) NOT NULL, "station_id" character varying(64) NOT NULL, "time_offset_minutes" integer NOT NULL DEFAULT '0', "height_offset_m" double precision NOT NULL DEFAULT '0', "bed_elevation_m" double precision NOT NULL, "route_elevation_m" double precision NOT NULL, "launch_name" character varying(120) NOT NULL DEFAULT '', "launch_distance_m" double precision NOT NULL DEFAULT '0', "working_depth_m" double precision NOT NULL DEFAULT '0.3', "craft_draft_m" double precision NOT NULL DEFAULT '0.15', "draft_margin_m" double precision NOT NULL DEFAULT '0.1', "min_window_minutes" integer NOT NULL DEFAULT '120', "include_civil_twilight" boolean NOT NULL DEFAULT false, "salinity_ppt" double precision, "notes" text NOT NULL DEFAULT '', "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), "updated_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), CONSTRAINT "UQ_9669a09fcc0eb6d2794a658f647" UNIQUE ("name"), CONSTRAINT "PK_635c0eeabda8862d5b0237b42b4" PRIMARY KEY ("id"))`);
    }

    public async down(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`DROP TABLE "site"`);
    }

}
