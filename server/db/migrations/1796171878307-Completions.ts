import type { MigrationInterface, QueryRunner } from "typeorm";

export class Completions1796171878307 implements MigrationInterface {
    name = 'Completions1796171878307'

    public async up(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`CREATE TABLE \`completions\` (\`id\` varchar(36) NOT NULL, \`taskId\` int NOT NULL, \`personId\` int NOT NULL, \`outcome\` enum ('done', 'skipped') NOT NULL, \`skipReason\` varchar(40) NULL, \`note\` text NULL, \`doneAt\` datetime(3) NOT NULL, \`lateMinutes\` int NULL, \`response\` json NULL, \`createdAt\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(6), INDEX \`IDX_7aaf2b0da97ec996dbde0761e8\` (\`taskId\`), PRIMARY KEY (\`id\`)) ENGINE=InnoDB`);
        await queryRunner.query(`CREATE TABLE \`readings\` (\`id\` bigint NOT NULL AUTO_INCREMENT, \`completionId\` varchar(36) NOT NULL, \`taskId\` int NOT NULL, \`tankId\` int NULL, \`systemId\` int NULL, \`parameterKey\` varchar(40) NOT NULL, \`value\` double NOT NULL, \`unit\` varchar(40) NOT NULL, \`band\` enum ('ok', 'watch', 'critical') NOT NULL, \`derived\` tinyint NOT NULL DEFAULT 0, \`takenAt\` datetime(3) NOT NULL, \`personId\` int NOT NULL, INDEX \`IDX_0309893658fc75eccfb83a5b26\` (\`tankId\`, \`parameterKey\`, \`takenAt\`), INDEX \`IDX_f68f023ab01c0f2b441c0bf88a\` (\`systemId\`, \`parameterKey\`, \`takenAt\`), INDEX \`IDX_373cf7245cf0de1902e5515f61\` (\`completionId\`), PRIMARY KEY (\`id\`)) ENGINE=InnoDB`);
        await queryRunner.query(`CREATE TABLE \`alerts\` (\`id\` int NOT NULL AUTO_INCREMENT, \`taskId\` int NOT NULL, \`kind\` enum ('critical_reading', 'missed_task') NOT NULL, \`detail\` varchar(500) NOT NULL, \`ladderId\` int NULL, \`startedAt\` datetime(3) NOT NULL, \`acknowledgedAt\` datetime(3) NULL, \`acknowledgedById\` int NULL, \`closedAt\` datetime(3) NULL, UNIQUE INDEX \`IDX_8de76f8322d0db6afa9ae3fb09\` (\`taskId\`, \`kind\`), INDEX \`IDX_6fbc9f28193cdae77605265b66\` (\`closedAt\`), PRIMARY KEY (\`id\`)) ENGINE=InnoDB`);
        await queryRunner.query(`ALTER TABLE \`people\` CHANGE \`createdAt\` \`createdAt\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(6)`);
        await queryRunner.query(`ALTER TABLE \`people\` CHANGE \`updatedAt\` \`updatedAt\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(6) ON UPDATE CURRENT_TIMESTAMP(6)`);
        await queryRunner.query(`ALTER TABLE \`routines\` CHANGE \`createdAt\` \`createdAt\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(6)`);
        await queryRunner.query(`ALTER TABLE \`routines\` CHANGE \`updatedAt\` \`updatedAt\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(6) ON UPDATE CURRENT_TIMESTAMP(6)`);
        await queryRunner.query(`ALTER TABLE \`tasks\` CHANGE \`createdAt\` \`createdAt\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(6)`);
        await queryRunner.query(`ALTER TABLE \`tasks\` CHANGE \`updatedAt\` \`updatedAt\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(6) ON UPDATE CURRENT_TIMESTAMP(6)`);
    }

    public async down(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`ALTER TABLE \`tasks\` CHANGE \`updatedAt\` \`updatedAt\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3) ON UPDATE CURRENT_TIMESTAMP(3)`);
        await queryRunner.query(`ALTER TABLE \`tasks\` CHANGE \`createdAt\` \`createdAt\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3)`);
        await queryRunner.query(`ALTER TABLE \`routines\` CHANGE \`updatedAt\` \`updatedAt\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3) ON UPDATE CURRENT_TIMESTAMP(3)`);
        await queryRunner.query(`ALTER TABLE \`routines\` CHANGE \`createdAt\` \`createdAt\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3)`);
        await queryRunner.query(`ALTER TABLE \`people\` CHANGE \`updatedAt\` \`updatedAt\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3) ON UPDATE CURRENT_TIMESTAMP(3)`);
        await queryRunner.query(`ALTER TABLE \`people\` CHANGE \`createdAt\` \`createdAt\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3)`);
        await queryRunner.query(`DROP INDEX \`IDX_6fbc9f28193cdae77605265b66\` ON \`alerts\``);
        await queryRunner.query(`DROP INDEX \`IDX_8de76f8322d0db6afa9ae3fb09\` ON \`alerts\``);
        await queryRunner.query(`DROP TABLE \`alerts\``);
        await queryRunner.query(`DROP INDEX \`IDX_373cf7245cf0de1902e5515f61\` ON \`readings\``);
        await queryRunner.query(`DROP INDEX \`IDX_f68f023ab01c0f2b441c0bf88a\` ON \`readings\``);
        await queryRunner.query(`DROP INDEX \`IDX_0309893658fc75eccfb83a5b26\` ON \`readings\``);
        await queryRunner.query(`DROP TABLE \`readings\``);
        await queryRunner.query(`DROP INDEX \`IDX_7aaf2b0da97ec996dbde0761e8\` ON \`completions\``);
        await queryRunner.query(`DROP TABLE \`completions\``);
    }

}
