import type { MigrationInterface, QueryRunner } from "typeorm";

export class ChangeOutbox1796530013000 implements MigrationInterface {
    name = 'ChangeOutbox1796530013000'

    public async up(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`CREATE TABLE \`change_outbox\` (\`id\` bigint NOT NULL AUTO_INCREMENT, \`kind\` enum ('task', 'tasks', 'routine', 'amendment', 'catalogue', 'facility', 'incident', 'event', 'roster', 'oxygen', 'stock', 'parameter', 'playbook') NOT NULL, \`entityId\` varchar(64) NULL, \`createdAt\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3), \`claimedBy\` varchar(64) NULL, \`claimedAt\` datetime(3) NULL, \`publishedAt\` datetime(3) NULL, INDEX \`IDX_change_outbox_published\` (\`publishedAt\`, \`id\`), PRIMARY KEY (\`id\`)) ENGINE=InnoDB`);
    }

    public async down(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`DROP TABLE \`change_outbox\``);
    }
}
