import type { MigrationInterface, QueryRunner } from "typeorm";

export class RosterAndMoves1796172129297 implements MigrationInterface {
    name = 'RosterAndMoves1796172129297'

    public async up(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`DROP INDEX \`uq_task_occurrence\` ON \`tasks\``);
        await queryRunner.query(`CREATE TABLE \`shifts\` (\`id\` int NOT NULL AUTO_INCREMENT, \`personId\` int NOT NULL, \`date\` varchar(10) NOT NULL, \`start\` varchar(5) NOT NULL, \`end\` varchar(5) NOT NULL, \`kind\` enum ('day', 'early', 'late', 'weekend') NOT NULL, INDEX \`IDX_01a43905fce3aabc2d113840bc\` (\`date\`), INDEX \`IDX_0226947e6c9f2c961dcebaa119\` (\`personId\`, \`date\`), PRIMARY KEY (\`id\`)) ENGINE=InnoDB`);
        await queryRunner.query(`CREATE TABLE \`on_call_duties\` (\`id\` int NOT NULL AUTO_INCREMENT, \`personId\` int NOT NULL, \`fromDate\` varchar(10) NOT NULL, \`toDate\` varchar(10) NOT NULL, \`startsAt\` datetime(3) NOT NULL, \`endsAt\` datetime(3) NOT NULL, INDEX \`IDX_5cde4f6a99e01bd8983afab654\` (\`startsAt\`, \`endsAt\`), PRIMARY KEY (\`id\`)) ENGINE=InnoDB`);
        await queryRunner.query(`CREATE TABLE \`handover_notes\` (\`id\` int NOT NULL AUTO_INCREMENT, \`personId\` int NOT NULL, \`text\` text NOT NULL, \`createdAt\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(6), PRIMARY KEY (\`id\`)) ENGINE=InnoDB`);
        await queryRunner.query(`ALTER TABLE \`tasks\` ADD \`occurrenceStart\` varchar(19) NOT NULL`);
        // Existing tasks stand for the occurrence at their own start.
        await queryRunner.query(`UPDATE \`tasks\` SET \`occurrenceStart\` = \`localStart\``);
        await queryRunner.query(`ALTER TABLE \`people\` CHANGE \`createdAt\` \`createdAt\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(6)`);
        await queryRunner.query(`ALTER TABLE \`people\` CHANGE \`updatedAt\` \`updatedAt\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(6) ON UPDATE CURRENT_TIMESTAMP(6)`);
        await queryRunner.query(`ALTER TABLE \`routines\` CHANGE \`createdAt\` \`createdAt\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(6)`);
        await queryRunner.query(`ALTER TABLE \`routines\` CHANGE \`updatedAt\` \`updatedAt\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(6) ON UPDATE CURRENT_TIMESTAMP(6)`);
        await queryRunner.query(`ALTER TABLE \`tasks\` CHANGE \`createdAt\` \`createdAt\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(6)`);
        await queryRunner.query(`ALTER TABLE \`tasks\` CHANGE \`updatedAt\` \`updatedAt\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(6) ON UPDATE CURRENT_TIMESTAMP(6)`);
        await queryRunner.query(`ALTER TABLE \`completions\` CHANGE \`createdAt\` \`createdAt\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(6)`);
        await queryRunner.query(`ALTER TABLE \`photos\` CHANGE \`createdAt\` \`createdAt\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(6)`);
        await queryRunner.query(`CREATE UNIQUE INDEX \`uq_task_occurrence\` ON \`tasks\` (\`routineId\`, \`targetKind\`, \`targetId\`, \`occurrenceStart\`)`);
    }

    public async down(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`DROP INDEX \`uq_task_occurrence\` ON \`tasks\``);
        await queryRunner.query(`ALTER TABLE \`photos\` CHANGE \`createdAt\` \`createdAt\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3)`);
        await queryRunner.query(`ALTER TABLE \`completions\` CHANGE \`createdAt\` \`createdAt\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3)`);
        await queryRunner.query(`ALTER TABLE \`tasks\` CHANGE \`updatedAt\` \`updatedAt\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3) ON UPDATE CURRENT_TIMESTAMP(3)`);
        await queryRunner.query(`ALTER TABLE \`tasks\` CHANGE \`createdAt\` \`createdAt\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3)`);
        await queryRunner.query(`ALTER TABLE \`routines\` CHANGE \`updatedAt\` \`updatedAt\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3) ON UPDATE CURRENT_TIMESTAMP(3)`);
        await queryRunner.query(`ALTER TABLE \`routines\` CHANGE \`createdAt\` \`createdAt\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3)`);
        await queryRunner.query(`ALTER TABLE \`people\` CHANGE \`updatedAt\` \`updatedAt\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3) ON UPDATE CURRENT_TIMESTAMP(3)`);
        await queryRunner.query(`ALTER TABLE \`people\` CHANGE \`createdAt\` \`createdAt\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3)`);
        await queryRunner.query(`ALTER TABLE \`tasks\` DROP COLUMN \`occurrenceStart\``);
        await queryRunner.query(`DROP TABLE \`handover_notes\``);
        await queryRunner.query(`DROP INDEX \`IDX_5cde4f6a99e01bd8983afab654\` ON \`on_call_duties\``);
        await queryRunner.query(`DROP TABLE \`on_call_duties\``);
        await queryRunner.query(`DROP INDEX \`IDX_0226947e6c9f2c961dcebaa119\` ON \`shifts\``);
        await queryRunner.query(`DROP INDEX \`IDX_01a43905fce3aabc2d113840bc\` ON \`shifts\``);
        await queryRunner.query(`DROP TABLE \`shifts\``);
        await queryRunner.query(`CREATE UNIQUE INDEX \`uq_task_occurrence\` ON \`tasks\` (\`routineId\`, \`targetKind\`, \`targetId\`, \`localStart\`)`);
    }

}
