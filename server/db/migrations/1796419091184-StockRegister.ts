import type { MigrationInterface, QueryRunner } from "typeorm";

export class StockRegister1796419091184 implements MigrationInterface {
    name = 'StockRegister1796419091184'

    public async up(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`CREATE TABLE \`stock_movements\` (\`id\` int NOT NULL AUTO_INCREMENT, \`batchId\` int NOT NULL, \`kind\` enum ('arrival', 'transfer', 'grading', 'mortality', 'cull', 'sampling', 'dispatch', 'correction') NOT NULL, \`occurredAt\` datetime(3) NOT NULL, \`fromTankId\` int NULL, \`toTankId\` int NULL, \`count\` int NOT NULL, \`meanWeightG\` double NULL, \`origin\` varchar(200) NULL, \`permitRef\` varchar(120) NULL, \`healthCertificateRef\` varchar(120) NULL, \`transportWater\` json NULL, \`destination\` varchar(200) NULL, \`reason\` varchar(500) NULL, \`cause\` varchar(80) NULL, \`causeText\` varchar(500) NULL, \`necropsy\` tinyint NOT NULL DEFAULT 0, \`correctsId\` int NULL, \`completionId\` varchar(36) NULL, \`sourceKey\` varchar(60) NULL, \`note\` text NULL, \`personId\` int NOT NULL, \`createdAt\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3), INDEX \`IDX_46a673d8c21bfe45da27ad6aaf\` (\`batchId\`, \`occurredAt\`), INDEX \`IDX_fbe29548dbc7146d30071a2a5e\` (\`fromTankId\`), INDEX \`IDX_49b25dc443fb2b2e01e2726fbb\` (\`toTankId\`), INDEX \`IDX_00da547a0c4bacb6613172183d\` (\`completionId\`), UNIQUE INDEX \`IDX_02089f5126550237739171b3db\` (\`sourceKey\`), PRIMARY KEY (\`id\`)) ENGINE=InnoDB`);
        await queryRunner.query(`CREATE TABLE \`animal_record_settings\` (\`id\` int NOT NULL, \`mortalityCauses\` json NOT NULL, \`mortalityWeekPct\` double NOT NULL DEFAULT '2', \`notifyWelfareOfficerHours\` int NOT NULL DEFAULT '24', \`notifyCommitteeHours\` int NOT NULL DEFAULT '72', \`fullReportHours\` int NOT NULL DEFAULT '168', PRIMARY KEY (\`id\`)) ENGINE=InnoDB`);
        // Batches that exist before the register get an opening balance: their count, spread over their tanks.
        const batches: Array<{ id: number; count: number; tankIds: string | number[]; origin: string; arrivalDate: string; meanWeightG: number }> = await queryRunner.query('SELECT id, count, tankIds, origin, arrivalDate, meanWeightG FROM batches')
        for (const b of batches) {
            const tankIds: number[] = typeof b.tankIds === 'string' ? JSON.parse(b.tankIds) : b.tankIds
            if (!b.count || !tankIds.length) continue
            const share = Math.floor(b.count / tankIds.length)
            for (const [i, tankId] of tankIds.entries()) {
                const n = i === 0 ? b.count - share * (tankIds.length - 1) : share
                if (n > 0) await queryRunner.query('INSERT INTO stock_movements (batchId, kind, occurredAt, toTankId, count, meanWeightG, origin, note, personId) VALUES (?, ?, ?, ?, ?, ?, ?, ?, 0)', [b.id, 'arrival', `${b.arrivalDate} 00:00:00`, tankId, n, b.meanWeightG, b.origin || 'Opening balance', 'Opening balance carried over from the batch record'])
            }
        }
    }

    public async down(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`DROP TABLE \`animal_record_settings\``);
        await queryRunner.query(`DROP INDEX \`IDX_02089f5126550237739171b3db\` ON \`stock_movements\``);
        await queryRunner.query(`DROP INDEX \`IDX_00da547a0c4bacb6613172183d\` ON \`stock_movements\``);
        await queryRunner.query(`DROP INDEX \`IDX_49b25dc443fb2b2e01e2726fbb\` ON \`stock_movements\``);
        await queryRunner.query(`DROP INDEX \`IDX_fbe29548dbc7146d30071a2a5e\` ON \`stock_movements\``);
        await queryRunner.query(`DROP INDEX \`IDX_46a673d8c21bfe45da27ad6aaf\` ON \`stock_movements\``);
        await queryRunner.query(`DROP TABLE \`stock_movements\``);
    }

}
