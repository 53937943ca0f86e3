import type { MigrationInterface, QueryRunner } from "typeorm";

export class CylinderReplaceTask1796530013001 implements MigrationInterface {
    name = 'CylinderReplaceTask1796530013001'

    public async up(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`ALTER TABLE \`oxygen_cylinders\` ADD \`replaceTaskId\` int NULL`);
        // Cylinders used to find their open replace task by its title: link the one open now.
        await queryRunner.query(`UPDATE \`oxygen_cylinders\` c SET c.\`replaceTaskId\` = (SELECT MAX(t.\`id\`) FROM \`tasks\` t WHERE t.\`title\` = CONCAT('Replace oxygen cylinder ', c.\`code\`) AND t.\`status\` NOT IN ('done', 'skipped'))`);
    }

    public async down(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`ALTER TABLE \`oxygen_cylinders\` DROP COLUMN \`replaceTaskId\``);
    }
}
