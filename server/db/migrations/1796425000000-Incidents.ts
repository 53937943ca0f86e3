import type { MigrationInterface, QueryRunner } from "typeorm";

export class Incidents1796425000000 implements MigrationInterface {
    name = 'Incidents1796425000000'

    public async up(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`CREATE TABLE \`incidents\` (\`id\` int NOT NULL AUTO_INCREMENT, \`status\` enum ('proposed', 'dismissed', 'open', 'reported', 'closed') NOT NULL DEFAULT 'proposed', \`source\` enum ('missed_task', 'critical_recheck', 'mortality_threshold', 'manual') NOT NULL, \`sourceKey\` varchar(60) NULL, \`taskId\` int NULL, \`title\` varchar(160) NOT NULL, \`whatHappened\` text NOT NULL, \`startedAt\` datetime(3) NOT NULL, \`noticedAt\` datetime(3) NOT NULL, \`tankIds\` json NOT NULL, \`batchIds\` json NOT NULL, \`personIds\` json NOT NULL, \`affected\` int NOT NULL DEFAULT '0', \`dead\` int NOT NULL DEFAULT '0', \`immediateActions\` text NOT NULL, \`told\` json NOT NULL, \`rootCause\` text NOT NULL, \`correctiveActions\` text NOT NULL, \`decisionReason\` varchar(500) NULL, \`decidedById\` int NULL, \`decidedAt\` datetime(3) NULL, \`welfareDueAt\` datetime(3) NOT NULL, \`committeeDueAt\` datetime(3) NOT NULL, \`reportDueAt\` datetime(3) NOT NULL, \`reportedAt\` datetime(3) NULL, \`closedAt\` datetime(3) NULL, \`escalatedAt\` datetime(3) NULL, \`notes\` json NOT NULL, \`createdAt\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3), UNIQUE INDEX \`IDX_incidents_sourceKey\` (\`sourceKey\`), INDEX \`IDX_incidents_status_due\` (\`status\`, \`committeeDueAt\`), PRIMARY KEY (\`id\`)) ENGINE=InnoDB`);
        await queryRunner.query(`ALTER TABLE \`alerts\` MODIFY \`kind\` enum ('critical_reading', 'missed_task', 'incident_overdue') NOT NULL`);
    }

    public async down(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`DELETE FROM \`alerts\` WHERE \`kind\` = 'incident_overdue'`);
        await queryRunner.query(`ALTER TABLE \`alerts\` MODIFY \`kind\` enum ('critical_reading', 'missed_task') NOT NULL`);
        await queryRunner.query(`DROP TABLE \`incidents\``);
    }
}
