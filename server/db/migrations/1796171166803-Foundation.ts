import type { MigrationInterface, QueryRunner } from "typeorm";

export class Foundation1796171166803 implements MigrationInterface {
    name = 'Foundation1796171166803'

    public async up(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`CREATE TABLE \`people\` (\`id\` int NOT NULL AUTO_INCREMENT, \`email\` varchar(200) NOT NULL, \`name\` varchar(120) NOT NULL, \`title\` varchar(160) NULL, \`phone\` varchar(40) NULL, \`role\` enum ('manager', 'supervisor', 'technician', 'observer') NOT NULL, \`passwordHash\` varchar(100) NOT NULL, \`active\` tinyint NOT NULL DEFAULT 1, \`onCallEligible\` tinyint NOT NULL DEFAULT 0, \`sessionVersion\` int NOT NULL DEFAULT '0', \`createdAt\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(6), \`updatedAt\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(6) ON UPDATE CURRENT_TIMESTAMP(6), UNIQUE INDEX \`IDX_c77e8752faa45901af2b245dff\` (\`email\`), PRIMARY KEY (\`id\`)) ENGINE=InnoDB`);
    }

    public async down(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`DROP INDEX \`IDX_c77e8752faa45901af2b245dff\` ON \`people\``);
        await queryRunner.query(`DROP TABLE \`people\``);
    }

}
