import { MigrationInterface, QueryRunner } from "typeorm";

export class GivingRecentGifts1796413876346 implements MigrationInterface {
    name = 'GivingRecentGifts1796413876346'

    public async up(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`CREATE INDEX "IDX_0e80c3edcb535755074cff5776" ON "donations" ("appealId", "succeededAt") `);
    }

    public async down(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`DROP INDEX "IDX_0e80c3edcb535755074cff5776"`);
    }

}
