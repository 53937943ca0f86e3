import type { MigrationInterface, QueryRunner } from "typeorm";

export class PlaybooksOxygen1796173176412 implements MigrationInterface {
    name = 'PlaybooksOxygen1796173176412'

    public async up(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`CREATE TABLE \`playbooks\` (\`id\` int NOT NULL AUTO_INCREMENT, \`name\` varchar(160) NOT NULL, \`kind\` enum ('arrival', 'transfer', 'grading', 'weighing', 'sampling', 'harvest', 'dispatch', 'treatment', 'other') NOT NULL, \`description\` text NOT NULL, \`fastingHours\` int NOT NULL DEFAULT '0', \`steps\` json NOT NULL, PRIMARY KEY (\`id\`)) ENGINE=InnoDB`);
        await queryRunner.query(`CREATE TABLE \`events\` (\`id\` int NOT NULL AUTO_INCREMENT, \`playbookId\` int NOT NULL, \`kind\` enum ('arrival', 'transfer', 'grading', 'weighing', 'sampling', 'harvest', 'dispatch', 'treatment', 'other') NOT NULL, \`title\` varchar(160) NOT NULL, \`localStart\` varchar(19) NOT NULL, \`startsAt\` datetime(3) NOT NULL, \`tankIds\` json NOT NULL, \`batchId\` int NULL, \`notes\` text NOT NULL, \`status\` enum ('planned', 'ended', 'cancelled') NOT NULL DEFAULT 'planned', \`fastingFrom\` datetime(3) NULL, \`fastingTo\` datetime(3) NULL, \`createdById\` int NOT NULL, \`version\` int NOT NULL DEFAULT '1', INDEX \`IDX_e0da647c004a695b1d55a073e8\` (\`startsAt\`), PRIMARY KEY (\`id\`)) ENGINE=InnoDB`);
        await queryRunner.query(`CREATE TABLE \`batch_records\` (\`id\` int NOT NULL AUTO_INCREMENT, \`batchId\` int NOT NULL, \`eventId\` int NULL, \`kind\` enum ('transport_box', 'transport_water', 'weighing', 'bath', 'note', 'review') NOT NULL, \`data\` json NOT NULL, \`personId\` int NOT NULL, \`createdAt\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(6), INDEX \`IDX_705f210e87315accee2d06f826\` (\`batchId\`), PRIMARY KEY (\`id\`)) ENGINE=InnoDB`);
        await queryRunner.query(`CREATE TABLE \`oxygen_cylinders\` (\`id\` int NOT NULL AUTO_INCREMENT, \`code\` varchar(40) NOT NULL, \`label\` varchar(160) NOT NULL, \`method\` enum ('metric', 'psi-factor') NOT NULL, \`waterCapacityL\` double NULL, \`factorLPerPsi\` double NULL, \`compressibility\` double NULL, \`reservePressure\` double NOT NULL, \`lastPressure\` double NULL, \`flowLPerMin\` double NOT NULL DEFAULT '0', \`lastReadAt\` datetime(3) NULL, \`active\` tinyint NOT NULL DEFAULT 1, UNIQUE INDEX \`IDX_da5ed81c9d6f174e9798927366\` (\`code\`), PRIMARY KEY (\`id\`)) ENGINE=InnoDB`);
        await queryRunner.query(`ALTER TABLE \`batches\` ADD \`feedRatePct\` double NULL`);
        await queryRunner.query(`ALTER TABLE \`people\` CHANGE \`createdAt\` \`createdAt\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(6)`);
        await queryRunner.query(`ALTER TABLE \`people\` CHANGE \`updatedAt\` \`updatedAt\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(6) ON UPDATE CURRENT_TIMESTAMP(6)`);
        await queryRunner.query(`ALTER TABLE \`routines\` CHANGE \`createdAt\` \`createdAt\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(6)`);
        await queryRunner.query(`ALTER TABLE \`routines\` CHANGE \`updatedAt\` \`updatedAt\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(6) ON UPDATE CURRENT_TIMESTAMP(6)`);
        await queryRunner.query(`ALTER TABLE \`tasks\` CHANGE \`createdAt\` \`createdAt\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(6)`);
        await queryRunner.query(`ALTER TABLE \`tasks\` CHANGE \`updatedAt\` \`updatedAt\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(6) ON UPDATE CURRENT_TIMESTAMP(6)`);
        await queryRunner.query(`ALTER TABLE \`completions\` CHANGE \`createdAt\` \`createdAt\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(6)`);
        await queryRunner.query(`ALTER TABLE \`photos\` CHANGE \`createdAt\` \`createdAt\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(6)`);
        await queryRunner.query(`ALTER TABLE \`handover_notes\` CHANGE \`createdAt\` \`createdAt\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(6)`);
        await queryRunner.query(`ALTER TABLE \`notifications\` CHANGE \`createdAt\` \`createdAt\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(6)`);
    }

    public async down(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`ALTER TABLE \`notifications\` CHANGE \`createdAt\` \`createdAt\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3)`);
        await queryRunner.query(`ALTER TABLE \`handover_notes\` CHANGE \`createdAt\` \`createdAt\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3)`);
        await queryRunner.query(`ALTER TABLE \`photos\` CHANGE \`createdAt\` \`createdAt\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3)`);
        await queryRunner.query(`ALTER TABLE \`completions\` CHANGE \`createdAt\` \`createdAt\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3)`);
        await queryRunner.query(`ALTER TABLE \`tasks\` CHANGE \`updatedAt\` \`updatedAt\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3) ON UPDATE CURRENT_TIMESTAMP(3)`);
        await queryRunner.query(`ALTER TABLE \`tasks\` CHANGE \`createdAt\` \`createdAt\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3)`);
        await queryRunner.query(`ALTER TABLE \`routines\` CHANGE \`updatedAt\` \`updatedAt\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3) ON UPDATE CURRENT_TIMESTAMP(3)`);
        await queryRunner.query(`ALTER TABLE \`routines\` CHANGE \`createdAt\` \`createdAt\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3)`);
        await queryRunner.query(`ALTER TABLE \`people\` CHANGE \`updatedAt\` \`updatedAt\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3) ON UPDATE CURRENT_TIMESTAMP(3)`);
        await queryRunner.query(`ALTER TABLE \`people\` CHANGE \`createdAt\` \`createdAt\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3)`);
        await queryRunner.query(`ALTER TABLE \`batches\` DROP COLUMN \`feedRatePct\``);
        await queryRunner.query(`DROP INDEX \`IDX_da5ed81c9d6f174e9798927366\` ON \`oxygen_cylinders\``);
        await queryRunner.query(`DROP TABLE \`oxygen_cylinders\``);
        await queryRunner.query(`DROP INDEX \`IDX_705f210e87315accee2d06f826\` ON \`batch_records\``);
        await queryRunner.query(`DROP TABLE \`batch_records\``);
        await queryRunner.query(`DROP INDEX \`IDX_e0da647c004a695b1d55a073e8\` ON \`events\``);
        await queryRunner.query(`DROP TABLE \`events\``);
        await queryRunner.query(`DROP TABLE \`playbooks\``);
    }

}
