import type { MigrationInterface, QueryRunner } from 'typeorm';

/** Organisation setting: weights of the low-water window ranking. */
export class AddWindowWeights1796163225373 implements MigrationInterface {
    name = 'AddWindowWeights1796163225373'

    public async up(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`ALTER TABLE "organisation" ADD "window_weights" jsonb NOT NULL DEFAULT '{"duration":0.4,"lowWater":0.2,"weekend":0.25,"startHour":0.15}'`);
    }

    public async down(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`ALTER TABLE "organisation" DROP COLUMN "window_weights"`);
    }

}
