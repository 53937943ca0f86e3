import type { MigrationInterface, QueryRunner } from "typeorm";

export class OnCallChannels1796465534514 implements MigrationInterface {
    name = 'OnCallChannels1796465534514'

    public async up(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`DROP INDEX \`IDX_f6722bbe147ff720c2c0206103\` ON \`notifications\``);
        await queryRunner.query(`CREATE TABLE \`text_outbox\` (\`id\` int NOT NULL AUTO_INCREMENT, \`sid\` varchar(40) NOT NULL, \`direction\` enum ('outbound', 'inbound') NOT NULL, \`to\` varchar(40) NOT NULL, \`from\` varchar(40) NOT NULL, \`body\` text NOT NULL, \`status\` varchar(20) NOT NULL, \`statusCallback\` varchar(500) NULL, \`receivedAt\` datetime(3) NOT NULL, UNIQUE INDEX \`IDX_9e73838fe31f07642a1643f60b\` (\`sid\`), PRIMARY KEY (\`id\`)) ENGINE=InnoDB`);
        await queryRunner.query(`CREATE TABLE \`text_quotas\` (\`personId\` int NOT NULL, \`hourStart\` datetime(0) NOT NULL, \`used\` int NOT NULL DEFAULT '0', \`suppressed\` int NOT NULL DEFAULT '0', \`summaryStatus\` enum ('none', 'sending', 'sent', 'failed') NOT NULL DEFAULT 'none', \`summaryProviderId\` varchar(64) NULL, PRIMARY KEY (\`personId\`, \`hourStart\`)) ENGINE=InnoDB`);
        await queryRunner.query(`ALTER TABLE \`people\` ADD \`channels\` json NULL`);
        await queryRunner.query(`ALTER TABLE \`notifications\` ADD \`channel\` enum ('email', 'sms', 'push') NOT NULL DEFAULT 'email'`);
        await queryRunner.query(`ALTER TABLE \`notifications\` ADD \`destination\` varchar(1000) NULL`);
        await queryRunner.query(`ALTER TABLE \`notifications\` ADD \`providerId\` varchar(64) NULL`);
        await queryRunner.query(`ALTER TABLE \`notifications\` ADD \`providerStatus\` varchar(40) NULL`);
        await queryRunner.query(`ALTER TABLE \`notifications\` ADD \`replyCode\` varchar(8) NULL`);
        await queryRunner.query(`ALTER TABLE \`notifications\` CHANGE \`status\` \`status\` enum ('pending', 'sending', 'sent', 'failed', 'held', 'superseded', 'undelivered', 'suppressed') NOT NULL DEFAULT 'pending'`);
        await queryRunner.query(`CREATE UNIQUE INDEX \`IDX_notifications_alert_step_person_channel\` ON \`notifications\` (\`alertId\`, \`step\`, \`personId\`, \`channel\`)`);
        await queryRunner.query(`CREATE INDEX \`IDX_notifications_provider\` ON \`notifications\` (\`providerId\`)`);
    }

    public async down(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`DROP INDEX \`IDX_notifications_provider\` ON \`notifications\``);
        await queryRunner.query(`DROP INDEX \`IDX_notifications_alert_step_person_channel\` ON \`notifications\``);
        await queryRunner.query(`ALTER TABLE \`notifications\` CHANGE \`status\` \`status\` enum ('pending', 'sending', 'sent', 'failed', 'held', 'superseded') NOT NULL DEFAULT 'pending'`);
        await queryRunner.query(`ALTER TABLE \`notifications\` DROP COLUMN \`replyCode\``);
        await queryRunner.query(`ALTER TABLE \`notifications\` DROP COLUMN \`providerStatus\``);
        await queryRunner.query(`ALTER TABLE \`notifications\` DROP COLUMN \`providerId\``);
        await queryRunner.query(`ALTER TABLE \`notifications\` DROP COLUMN \`destination\``);
        await queryRunner.query(`ALTER TABLE \`notifications\` DROP COLUMN \`channel\``);
        await queryRunner.query(`ALTER TABLE \`people\` DROP COLUMN \`channels\``);
        await queryRunner.query(`DROP TABLE \`text_quotas\``);
        await queryRunner.query(`DROP INDEX \`IDX_9e73838fe31f07642a1643f60b\` ON \`text_outbox\``);
        await queryRunner.query(`DROP TABLE \`text_outbox\``);
        await queryRunner.query(`CREATE UNIQUE INDEX \`IDX_f6722bbe147ff720c2c0206103\` ON \`notifications\` (\`alertId\`, \`step\`, \`personId\`)`);
    }

}
