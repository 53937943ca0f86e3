import type { MigrationInterface, QueryRunner } from 'typeorm'

/** What the local push service decrypted or refused, for the Outbox page (local mode). */
export class PushOutbox1796541200045 implements MigrationInterface {
  name = 'PushOutbox1796541200045'

  public async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(
      `CREATE TABLE \`push_outbox\` (\`id\` int NOT NULL AUTO_INCREMENT, \`endpoint\` varchar(1000) NOT NULL, \`status\` enum ('received', 'refused') NOT NULL, \`title\` varchar(300) NOT NULL, \`body\` text NOT NULL, \`note\` varchar(300) NULL, \`urgency\` varchar(20) NULL, \`receivedAt\` datetime(3) NOT NULL, PRIMARY KEY (\`id\`)) ENGINE=InnoDB`,
    )
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`DROP TABLE \`push_outbox\``)
  }
}
