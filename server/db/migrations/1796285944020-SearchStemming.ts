import { MigrationInterface, QueryRunner } from "typeorm";

const COLUMNS = `rowid, kind, record_id, vessel_id, scope, number, title, body, extra`;
const DEFINITION = `kind UNINDEXED, record_id UNINDEXED, vessel_id UNINDEXED, scope, number, title, body, extra`;

/**
 * Written by hand: the full-text index (server/search/search-index.ts) is rebuilt with the porter
 * stemmer over unicode61, so "lamp" finds "lamps". Every document is copied with its rowid.
 */
export class SearchStemming1796285944020 implements MigrationInterface {
    name = 'SearchStemming1796285944020'

    public async up(queryRunner: QueryRunner): Promise<void> {
        await rebuild(queryRunner, `porter unicode61 remove_diacritics 2`);
    }

    public async down(queryRunner: QueryRunner): Promise<void> {
        await rebuild(queryRunner, `unicode61 remove_diacritics 2`);
    }
}

async function rebuild(queryRunner: QueryRunner, tokenize: string): Promise<void> {
    await queryRunner.query(`ALTER TABLE "search_documents" RENAME TO "temporary_search_documents"`);
    await queryRunner.query(`CREATE VIRTUAL TABLE "search_documents" USING fts5(${DEFINITION}, tokenize = '${tokenize}', prefix = '2 3')`);
    await queryRunner.query(`INSERT INTO "search_documents" (${COLUMNS}) SELECT ${COLUMNS} FROM "temporary_search_documents"`);
    await queryRunner.query(`DROP TABLE "temporary_search_documents"`);
}
