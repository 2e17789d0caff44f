import { MigrationInterface, QueryRunner } from "typeorm";

/**
 * Written by hand: tours (kind 3) and tour stops (kind 4) join the full-text index. Tours and stops
 * saved before this have no document yet, so each gets one here, with the rowid that
 * rowIdOf() in server/search/search-index.ts gives (record id × 16 + the kind's position).
 */
export class TourSearch1796414821822 implements MigrationInterface {
    name = 'TourSearch1796414821822'

    public async up(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`INSERT INTO "search_documents" (rowid, kind, record_id, vessel_id, scope, number, title, body, extra) SELECT t."id" * 16 + 3, 'tour', t."id", t."vesselId", 'tour' || t."vesselId", t."slug", t."title", t."summary", '' FROM "tours" t`);
        await queryRunner.query(`INSERT INTO "search_documents" (rowid, kind, record_id, vessel_id, scope, number, title, body, extra) SELECT s."id" * 16 + 4, 'tour-stop', s."id", t."vesselId", 'tour-stop' || t."vesselId", '', s."title", s."textPlain", s."lookFor" FROM "tour_stops" s JOIN "tours" t ON t."id" = s."tourId"`);
    }

    public async down(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`DELETE FROM "search_documents" WHERE kind IN ('tour', 'tour-stop')`);
    }
}
