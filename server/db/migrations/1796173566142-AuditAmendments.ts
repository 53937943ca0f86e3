import type { MigrationInterface, QueryRunner } from "typeorm";

export class AuditAmendments1796173566142 implements MigrationInterface {
    name = 'AuditAmendments1796173566142'

    public async up(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`CREATE TABLE \`audit_log\` (\`id\` bigint NOT NULL AUTO_INCREMENT, \`at\` datetime(3) NOT NULL, \`personId\` int NULL, \`entity\` enum ('routine', 'playbook', 'limit', 'ladder', 'shift', 'on_call', 'assignment', 'person', 'completion', 'event', 'facility') NOT NULL, \`entityId\` varchar(40) NOT NULL, \`action\` enum ('create', 'update', 'delete', 'amend') NOT NULL, \`before\` json NULL, \`after\` json NULL, INDEX \`IDX_e3a9d2038eafa6c7cfe9e40853\` (\`entity\`, \`entityId\`), INDEX \`IDX_ba27cef5b8b2b1a756e06ebcc5\` (\`at\`), PRIMARY KEY (\`id\`)) ENGINE=InnoDB`);
        await queryRunner.query(`CREATE TABLE \`completion_amendments\` (\`id\` int NOT NULL AUTO_INCREMENT, \`completionId\` varchar(36) NOT NULL, \`personId\` int NOT NULL, \`reason\` varchar(1000) NOT NULL, \`readings\` json NOT NULL, \`note\` text NULL, \`createdAt\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(6), INDEX \`IDX_225313903b4f65d8baff06d3d3\` (\`completionId\`), PRIMARY KEY (\`id\`)) ENGINE=InnoDB`);
        await queryRunner.query(`ALTER TABLE \`completions\` ADD \`enteredById\` int NULL`);
        await queryRunner.query(`ALTER TABLE \`readings\` ADD \`supersededAt\` datetime(3) NULL`);
        await queryRunner.query(`ALTER TABLE \`readings\` ADD \`amendmentId\` int NULL`);
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
        await queryRunner.query(`ALTER TABLE \`batch_records\` CHANGE \`createdAt\` \`createdAt\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(6)`);
    }

    public async down(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`ALTER TABLE \`batch_records\` CHANGE \`createdAt\` \`createdAt\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3)`);
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
        await queryRunner.query(`ALTER TABLE \`readings\` DROP COLUMN \`amendmentId\``);
        await queryRunner.query(`ALTER TABLE \`readings\` DROP COLUMN \`supersededAt\``);
        await queryRunner.query(`ALTER TABLE \`completions\` DROP COLUMN \`enteredById\``);
        await queryRunner.query(`DROP INDEX \`IDX_225313903b4f65d8baff06d3d3\` ON \`completion_amendments\``);
        await queryRunner.query(`DROP TABLE \`completion_amendments\``);
        await queryRunner.query(`DROP INDEX \`IDX_ba27cef5b8b2b1a756e06ebcc5\` ON \`audit_log\``);
        await queryRunner.query(`DROP INDEX \`IDX_e3a9d2038eafa6c7cfe9e40853\` ON \`audit_log\``);
        await queryRunner.query(`DROP TABLE \`audit_log\``);
    }

}
