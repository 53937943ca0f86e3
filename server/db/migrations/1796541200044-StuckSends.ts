import type { MigrationInterface, QueryRunner } from 'typeorm'

/** When a message was claimed for sending, and `unknown` for one whose sender stopped before the provider answered. */
export class StuckSends1796541200044 implements MigrationInterface {
  name = 'StuckSends1796541200044'

  public async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE \`notifications\` ADD \`claimedAt\` datetime(3) NULL`)
    await queryRunner.query(
      `ALTER TABLE \`notifications\` CHANGE \`status\` \`status\` enum ('pending', 'sending', 'sent', 'failed', 'held', 'superseded', 'undelivered', 'suppressed', 'unknown') NOT NULL DEFAULT 'pending'`,
    )
    // Rows already claimed have no claim time; the bound counts from the upgrade, so a send still in flight is not judged early.
    await queryRunner.query(`UPDATE \`notifications\` SET \`claimedAt\` = CURRENT_TIMESTAMP(3) WHERE \`status\` = 'sending'`)
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`UPDATE \`notifications\` SET \`status\` = 'undelivered' WHERE \`status\` = 'unknown'`)
    await queryRunner.query(
      `ALTER TABLE \`notifications\` CHANGE \`status\` \`status\` enum ('pending', 'sending', 'sent', 'failed', 'held', 'superseded', 'undelivered', 'suppressed') NOT NULL DEFAULT 'pending'`,
    )
    await queryRunner.query(`ALTER TABLE \`notifications\` DROP COLUMN \`claimedAt\``)
  }
}
