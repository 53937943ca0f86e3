import type { MigrationInterface, QueryRunner } from "typeorm";

export class RoutinePlanningError1796421762016 implements MigrationInterface {
    name = 'RoutinePlanningError1796421762016'

    public async up(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`ALTER TABLE \`routines\` ADD \`planningError\` varchar(500) NULL`);
    }

    public async down(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`ALTER TABLE \`routines\` DROP COLUMN \`planningError\``);
    }
}
