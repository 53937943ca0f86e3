import type { MigrationInterface, QueryRunner } from "typeorm";

export class FacilityRoutinesTasks1796171523572 implements MigrationInterface {
    name = 'FacilityRoutinesTasks1796171523572'

    public async up(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`CREATE TABLE \`facilities\` (\`id\` int NOT NULL AUTO_INCREMENT, \`name\` varchar(120) NOT NULL, \`timeZone\` varchar(64) NOT NULL, \`handoverTime\` varchar(5) NOT NULL DEFAULT '08:00', \`quarantineDays\` int NOT NULL DEFAULT '30', \`arrivalTempDiffLimitC\` decimal(4,1) NOT NULL DEFAULT '2.0', \`minOxygenHours\` decimal(6,1) NOT NULL DEFAULT '12.0', PRIMARY KEY (\`id\`)) ENGINE=InnoDB`);
        await queryRunner.query(`CREATE TABLE \`areas\` (\`id\` int NOT NULL AUTO_INCREMENT, \`code\` varchar(40) NOT NULL, \`name\` varchar(120) NOT NULL, \`roundOrder\` int NOT NULL DEFAULT '0', \`quarantine\` tinyint NOT NULL DEFAULT 0, UNIQUE INDEX \`IDX_1ce4e4f7cd8d820081bc74aa16\` (\`code\`), PRIMARY KEY (\`id\`)) ENGINE=InnoDB`);
        await queryRunner.query(`CREATE TABLE \`systems\` (\`id\` int NOT NULL AUTO_INCREMENT, \`code\` varchar(40) NOT NULL, \`name\` varchar(120) NOT NULL, \`areaId\` int NULL, \`volumeL\` double NOT NULL, \`salinitySetpoint\` double NULL, UNIQUE INDEX \`IDX_4db6ce8e94a5e59c8bfed9dd16\` (\`code\`), PRIMARY KEY (\`id\`)) ENGINE=InnoDB`);
        await queryRunner.query(`CREATE TABLE \`tanks\` (\`id\` int NOT NULL AUTO_INCREMENT, \`code\` varchar(40) NOT NULL, \`name\` varchar(120) NOT NULL, \`areaId\` int NOT NULL, \`systemId\` int NULL, \`volumeL\` double NOT NULL, \`kind\` enum ('tank', 'bin') NOT NULL DEFAULT 'tank', \`inUse\` tinyint NOT NULL DEFAULT 1, INDEX \`IDX_f360478b48ea15fdee851558e1\` (\`areaId\`), INDEX \`IDX_638f566a00f2df9ed690f05f2e\` (\`systemId\`), UNIQUE INDEX \`IDX_aa22385965bc241936d8b8cf4c\` (\`code\`), PRIMARY KEY (\`id\`)) ENGINE=InnoDB`);
        await queryRunner.query(`CREATE TABLE \`equipment\` (\`id\` int NOT NULL AUTO_INCREMENT, \`code\` varchar(40) NOT NULL, \`name\` varchar(120) NOT NULL, \`kind\` varchar(60) NOT NULL, \`areaId\` int NULL, UNIQUE INDEX \`IDX_28ff1c401cb1a3bc16e28ec3df\` (\`code\`), PRIMARY KEY (\`id\`)) ENGINE=InnoDB`);
        await queryRunner.query(`CREATE TABLE \`batches\` (\`id\` int NOT NULL AUTO_INCREMENT, \`code\` varchar(40) NOT NULL, \`species\` varchar(120) NOT NULL, \`origin\` varchar(200) NOT NULL DEFAULT '', \`arrivalDate\` varchar(10) NOT NULL, \`count\` int NOT NULL, \`meanWeightG\` double NOT NULL, \`tankIds\` json NOT NULL, \`status\` enum ('quarantine', 'active', 'dispatched', 'ended') NOT NULL DEFAULT 'active', UNIQUE INDEX \`IDX_4c9f441d3c72ff374f73dfbd84\` (\`code\`), PRIMARY KEY (\`id\`)) ENGINE=InnoDB`);
        await queryRunner.query(`CREATE TABLE \`parameters\` (\`id\` int NOT NULL AUTO_INCREMENT, \`key\` varchar(40) NOT NULL, \`name\` varchar(120) NOT NULL, \`unit\` varchar(40) NOT NULL, \`decimals\` int NOT NULL DEFAULT '1', \`physicalMin\` double NOT NULL, \`physicalMax\` double NOT NULL, \`derived\` tinyint NOT NULL DEFAULT 0, UNIQUE INDEX \`IDX_161354b92a4dcf3dd6008ddc74\` (\`key\`), PRIMARY KEY (\`id\`)) ENGINE=InnoDB`);
        await queryRunner.query(`CREATE TABLE \`limits\` (\`id\` int NOT NULL AUTO_INCREMENT, \`parameterKey\` varchar(40) NOT NULL, \`scope\` enum ('facility', 'system', 'batch') NOT NULL, \`scopeId\` int NOT NULL DEFAULT '0', \`okMin\` double NULL, \`okMax\` double NULL, \`criticalMin\` double NULL, \`criticalMax\` double NULL, UNIQUE INDEX \`IDX_2190f910220c9e56f55df0857b\` (\`parameterKey\`, \`scope\`, \`scopeId\`), PRIMARY KEY (\`id\`)) ENGINE=InnoDB`);
        await queryRunner.query(`CREATE TABLE \`routines\` (\`id\` int NOT NULL AUTO_INCREMENT, \`name\` varchar(160) NOT NULL, \`category\` enum ('welfare', 'feeding', 'water_quality', 'life_support', 'quarantine', 'maintenance', 'hygiene', 'calibration', 'alarms', 'stores', 'stock', 'veterinary', 'records', 'research', 'on_call') NOT NULL, \`instructions\` text NOT NULL, \`targetKind\` enum ('facility', 'area', 'system', 'tank', 'equipment', 'batch', 'area_tanks') NOT NULL, \`targetIds\` json NOT NULL, \`onlyInUse\` tinyint NOT NULL DEFAULT 1, \`rrule\` varchar(500) NOT NULL, \`dtstart\` varchar(19) NOT NULL, \`durationMinutes\` int NOT NULL DEFAULT '5', \`windowBeforeMinutes\` int NOT NULL DEFAULT '30', \`graceMinutes\` int NOT NULL DEFAULT '60', \`priority\` enum ('routine', 'welfare_critical') NOT NULL DEFAULT 'routine', \`assigneeRule\` json NOT NULL, \`requiredReadings\` json NOT NULL, \`activeFrom\` varchar(10) NULL, \`activeTo\` varchar(10) NULL, \`paused\` tinyint NOT NULL DEFAULT 0, \`skipDates\` json NOT NULL, \`ladderId\` int NULL, \`version\` int NOT NULL DEFAULT '1', \`createdAt\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(6), \`updatedAt\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(6) ON UPDATE CURRENT_TIMESTAMP(6), PRIMARY KEY (\`id\`)) ENGINE=InnoDB`);
        await queryRunner.query(`CREATE TABLE \`tasks\` (\`id\` int NOT NULL AUTO_INCREMENT, \`routineId\` int NULL, \`eventId\` int NULL, \`title\` varchar(160) NOT NULL, \`category\` enum ('welfare', 'feeding', 'water_quality', 'life_support', 'quarantine', 'maintenance', 'hygiene', 'calibration', 'alarms', 'stores', 'stock', 'veterinary', 'records', 'research', 'on_call') NOT NULL, \`instructions\` text NOT NULL, \`priority\` enum ('routine', 'welfare_critical') NOT NULL DEFAULT 'routine', \`targetKind\` enum ('facility', 'area', 'system', 'tank', 'equipment', 'batch', 'area_tanks') NOT NULL, \`targetId\` int NOT NULL DEFAULT '0', \`tankId\` int NULL, \`areaId\` int NULL, \`localDate\` varchar(10) NOT NULL, \`localStart\` varchar(19) NOT NULL, \`dueAt\` datetime(3) NOT NULL, \`windowStartAt\` datetime(3) NOT NULL, \`graceUntil\` datetime(3) NOT NULL, \`durationMinutes\` int NOT NULL, \`status\` enum ('planned', 'open', 'overdue', 'missed', 'done', 'skipped', 'held') NOT NULL DEFAULT 'planned', \`assigneeId\` int NULL, \`assignedManually\` tinyint NOT NULL DEFAULT 0, \`edited\` tinyint NOT NULL DEFAULT 0, \`requiredReadings\` json NOT NULL, \`flag\` enum ('ok', 'watch', 'critical') NULL, \`lateMinutes\` int NULL, \`completedAt\` datetime(3) NULL, \`completedById\` int NULL, \`heldReason\` varchar(300) NULL, \`recheckOfTaskId\` int NULL, \`version\` int NOT NULL DEFAULT '1', \`createdAt\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(6), \`updatedAt\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(6) ON UPDATE CURRENT_TIMESTAMP(6), UNIQUE INDEX \`uq_task_occurrence\` (\`routineId\`, \`targetKind\`, \`targetId\`, \`localStart\`), INDEX \`IDX_db10accba051680809cccc93e3\` (\`localDate\`, \`status\`), INDEX \`IDX_506ccd9e8dbe46fb07fa1b94a0\` (\`assigneeId\`, \`localDate\`), INDEX \`IDX_dce0623d6b9b9203bad91e6c72\` (\`tankId\`, \`localDate\`), INDEX \`IDX_d88c060c47a4b1ae8bc3d8051f\` (\`status\`, \`dueAt\`), PRIMARY KEY (\`id\`)) ENGINE=InnoDB`);
        await queryRunner.query(`ALTER TABLE \`people\` CHANGE \`createdAt\` \`createdAt\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(6)`);
        await queryRunner.query(`ALTER TABLE \`people\` CHANGE \`updatedAt\` \`updatedAt\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(6) ON UPDATE CURRENT_TIMESTAMP(6)`);
    }

    public async down(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`ALTER TABLE \`people\` CHANGE \`updatedAt\` \`updatedAt\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3) ON UPDATE CURRENT_TIMESTAMP(3)`);
        await queryRunner.query(`ALTER TABLE \`people\` CHANGE \`createdAt\` \`createdAt\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3)`);
        await queryRunner.query(`DROP INDEX \`IDX_d88c060c47a4b1ae8bc3d8051f\` ON \`tasks\``);
        await queryRunner.query(`DROP INDEX \`IDX_dce0623d6b9b9203bad91e6c72\` ON \`tasks\``);
        await queryRunner.query(`DROP INDEX \`IDX_506ccd9e8dbe46fb07fa1b94a0\` ON \`tasks\``);
        await queryRunner.query(`DROP INDEX \`IDX_db10accba051680809cccc93e3\` ON \`tasks\``);
        await queryRunner.query(`DROP INDEX \`uq_task_occurrence\` ON \`tasks\``);
        await queryRunner.query(`DROP TABLE \`tasks\``);
        await queryRunner.query(`DROP TABLE \`routines\``);
        await queryRunner.query(`DROP INDEX \`IDX_2190f910220c9e56f55df0857b\` ON \`limits\``);
        await queryRunner.query(`DROP TABLE \`limits\``);
        await queryRunner.query(`DROP INDEX \`IDX_161354b92a4dcf3dd6008ddc74\` ON \`parameters\``);
        await queryRunner.query(`DROP TABLE \`parameters\``);
        await queryRunner.query(`DROP INDEX \`IDX_4c9f441d3c72ff374f73dfbd84\` ON \`batches\``);
        await queryRunner.query(`DROP TABLE \`batches\``);
        await queryRunner.query(`DROP INDEX \`IDX_28ff1c401cb1a3bc16e28ec3df\` ON \`equipment\``);
        await queryRunner.query(`DROP TABLE \`equipment\``);
        await queryRunner.query(`DROP INDEX \`IDX_aa22385965bc241936d8b8cf4c\` ON \`tanks\``);
        await queryRunner.query(`DROP INDEX \`IDX_638f566a00f2df9ed690f05f2e\` ON \`tanks\``);
        await queryRunner.query(`DROP INDEX \`IDX_f360478b48ea15fdee851558e1\` ON \`tanks\``);
        await queryRunner.query(`DROP TABLE \`tanks\``);
        await queryRunner.query(`DROP INDEX \`IDX_4db6ce8e94a5e59c8bfed9dd16\` ON \`systems\``);
        await queryRunner.query(`DROP TABLE \`systems\``);
        await queryRunner.query(`DROP INDEX \`IDX_1ce4e4f7cd8d820081bc74aa16\` ON \`areas\``);
        await queryRunner.query(`DROP TABLE \`areas\``);
        await queryRunner.query(`DROP TABLE \`facilities\``);
    }

}
