import type { MigrationInterface, QueryRunner } from "typeorm";

export class Escalation1796172492783 implements MigrationInterface {
    name = 'Escalation1796172492783'

    public async up(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`CREATE TABLE \`ladders\` (\`id\` int NOT NULL AUTO_INCREMENT, \`name\` varchar(120) NOT NULL, \`steps\` json NOT NULL, PRIMARY KEY (\`id\`)) ENGINE=InnoDB`);
        await queryRunner.query(`CREATE TABLE \`notifications\` (\`id\` int NOT NULL AUTO_INCREMENT, \`alertId\` int NOT NULL, \`step\` int NOT NULL, \`personId\` int NOT NULL, \`email\` varchar(200) NOT NULL, \`subject\` varchar(300) NOT NULL, \`status\` enum ('pending', 'sending', 'sent', 'failed', 'held', 'superseded') NOT NULL DEFAULT 'pending', \`urgent\` tinyint NOT NULL DEFAULT 0, \`attempts\` int NOT NULL DEFAULT '0', \`nextAttemptAt\` datetime(3) NOT NULL, \`lastError\` varchar(500) NULL, \`sentAt\` datetime(3) NULL, \`ackUsedAt\` datetime(3) NULL, \`createdAt\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(6), UNIQUE INDEX \`IDX_f6722bbe147ff720c2c0206103\` (\`alertId\`, \`step\`, \`personId\`), INDEX \`IDX_45b348394a902cde8038080f84\` (\`status\`, \`nextAttemptAt\`), PRIMARY KEY (\`id\`)) ENGINE=InnoDB`);
        await queryRunner.query(`CREATE TABLE \`outbox_messages\` (\`id\` int NOT NULL AUTO_INCREMENT, \`to\` varchar(500) NOT NULL, \`subject\` varchar(500) NOT NULL, \`text\` mediumtext NOT NULL, \`html\` mediumtext NOT NULL, \`receivedAt\` datetime(3) NOT NULL, PRIMARY KEY (\`id\`)) ENGINE=InnoDB`);
        await queryRunner.query(`CREATE TABLE \`digests\` (\`date\` varchar(10) NOT NULL, \`sentAt\` datetime(3) NOT NULL, PRIMARY KEY (\`date\`)) ENGINE=InnoDB`);
        await queryRunner.query(`ALTER TABLE \`people\` ADD \`quietStart\` varchar(5) NULL`);
        await queryRunner.query(`ALTER TABLE \`people\` ADD \`quietEnd\` varchar(5) NULL`);
        await queryRunner.query(`ALTER TABLE \`facilities\` ADD \`defaultLadderId\` int NULL`);
        await queryRunner.query(`ALTER TABLE \`facilities\` ADD \`fastLadderId\` int NULL`);
        await queryRunner.query(`ALTER TABLE \`facilities\` ADD \`digestTime\` varchar(5) NOT NULL DEFAULT '07:00'`);
        await queryRunner.query(`ALTER TABLE \`parameters\` ADD \`ladderId\` int NULL`);
        await queryRunner.query(`ALTER TABLE \`people\` CHANGE \`createdAt\` \`createdAt\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(6)`);
        await queryRunner.query(`ALTER TABLE \`people\` CHANGE \`updatedAt\` \`updatedAt\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(6) ON UPDATE CURRENT_TIMESTAMP(6)`);
        await queryRunner.query(`ALTER TABLE \`routines\` CHANGE \`createdAt\` \`createdAt\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(6)`);
        await queryRunner.query(`ALTER TABLE \`routines\` CHANGE \`updatedAt\` \`updatedAt\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(6) ON UPDATE CURRENT_TIMESTAMP(6)`);
        await queryRunner.query(`ALTER TABLE \`tasks\` CHANGE \`createdAt\` \`createdAt\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(6)`);
        await queryRunner.query(`ALTER TABLE \`tasks\` CHANGE \`updatedAt\` \`updatedAt\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(6) ON UPDATE CURRENT_TIMESTAMP(6)`);
        await queryRunner.query(`ALTER TABLE \`completions\` CHANGE \`createdAt\` \`createdAt\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(6)`);
        await queryRunner.query(`ALTER TABLE \`photos\` CHANGE \`createdAt\` \`createdAt\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(6)`);
        await queryRunner.query(`ALTER TABLE \`handover_notes\` CHANGE \`createdAt\` \`createdAt\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(6)`);
    }

    public async down(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`ALTER TABLE \`handover_notes\` CHANGE \`createdAt\` \`createdAt\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3)`);
        await queryRunner.query(`ALTER TABLE \`photos\` CHANGE \`createdAt\` \`createdAt\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3)`);
        await queryRunner.query(`ALTER TABLE \`completions\` CHANGE \`createdAt\` \`createdAt\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3)`);
        await queryRunner.query(`ALTER TABLE \`tasks\` CHANGE \`updatedAt\` \`updatedAt\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3) ON UPDATE CURRENT_TIMESTAMP(3)`);
        await queryRunner.query(`ALTER TABLE \`tasks\` CHANGE \`createdAt\` \`createdAt\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3)`);
        await queryRunner.query(`ALTER TABLE \`routines\` CHANGE \`updatedAt\` \`updatedAt\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3) ON UPDATE CURRENT_TIMESTAMP(3)`);
        await queryRunner.query(`ALTER TABLE \`routines\` CHANGE \`createdAt\` \`createdAt\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3)`);
        await queryRunner.query(`ALTER TABLE \`people\` CHANGE \`updatedAt\` \`updatedAt\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3) ON UPDATE CURRENT_TIMESTAMP(3)`);
        await queryRunner.query(`ALTER TABLE \`people\` CHANGE \`createdAt\` \`createdAt\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3)`);
        await queryRunner.query(`ALTER TABLE \`parameters\` DROP COLUMN \`ladderId\``);
        await queryRunner.query(`ALTER TABLE \`facilities\` DROP COLUMN \`digestTime\``);
        await queryRunner.query(`ALTER TABLE \`facilities\` DROP COLUMN \`fastLadderId\``);
        await queryRunner.query(`ALTER TABLE \`facilities\` DROP COLUMN \`defaultLadderId\``);
        await queryRunner.query(`ALTER TABLE \`people\` DROP COLUMN \`quietEnd\``);
        await queryRunner.query(`ALTER TABLE \`people\` DROP COLUMN \`quietStart\``);
        await queryRunner.query(`DROP TABLE \`digests\``);
        await queryRunner.query(`DROP TABLE \`outbox_messages\``);
        await queryRunner.query(`DROP INDEX \`IDX_45b348394a902cde8038080f84\` ON \`notifications\``);
        await queryRunner.query(`DROP INDEX \`IDX_f6722bbe147ff720c2c0206103\` ON \`notifications\``);
        await queryRunner.query(`DROP TABLE \`notifications\``);
        await queryRunner.query(`DROP TABLE \`ladders\``);
    }

}
