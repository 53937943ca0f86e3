import type { MigrationInterface, QueryRunner } from "typeorm";

export class AppSecrets1796420370601 implements MigrationInterface {
    name = 'AppSecrets1796420370601'

    public async up(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`CREATE TABLE \`app_secrets\` (\`name\` varchar(40) NOT NULL, \`value\` varchar(200) NOT NULL, \`createdAt\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3), PRIMARY KEY (\`name\`)) ENGINE=InnoDB`);
    }

    public async down(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`DROP TABLE \`app_secrets\``);
    }
}
