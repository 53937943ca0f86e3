import type { MigrationInterface, QueryRunner } from "typeorm";

/** Each of an incident's three deadlines is met by its own date and escalates once on its own. */
export class IncidentDeadlines1796431400000 implements MigrationInterface {
    name = 'IncidentDeadlines1796431400000'

    public async up(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`ALTER TABLE \`incidents\` ADD \`welfareNotifiedAt\` datetime(3) NULL, ADD \`welfareEscalatedAt\` datetime(3) NULL, ADD \`reportEscalatedAt\` datetime(3) NULL`);
        await queryRunner.query(`ALTER TABLE \`alerts\` MODIFY \`kind\` enum ('critical_reading', 'missed_task', 'incident_overdue', 'incident_welfare_overdue', 'incident_report_overdue') NOT NULL`);
    }

    public async down(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`DELETE FROM \`alerts\` WHERE \`kind\` IN ('incident_welfare_overdue', 'incident_report_overdue')`);
        await queryRunner.query(`ALTER TABLE \`alerts\` MODIFY \`kind\` enum ('critical_reading', 'missed_task', 'incident_overdue') NOT NULL`);
        await queryRunner.query(`ALTER TABLE \`incidents\` DROP COLUMN \`reportEscalatedAt\`, DROP COLUMN \`welfareEscalatedAt\`, DROP COLUMN \`welfareNotifiedAt\``);
    }
}
