import type { MigrationInterface, QueryRunner } from 'typeorm'

/**
 * Incidents a person files by hand: who filed them, and alerts that belong to an incident rather
 * than a task (a hand-filed incident has none). Incident alerts already started get their incident.
 */
export class HandFiledIncidents1796570000014 implements MigrationInterface {
  name = 'HandFiledIncidents1796570000014'

  public async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE \`incidents\` ADD \`filedById\` int NULL`)
    await queryRunner.query(
      `ALTER TABLE \`incidents\` ADD CONSTRAINT \`FK_incidents_filedById\` FOREIGN KEY (\`filedById\`) REFERENCES \`people\`(\`id\`) ON DELETE RESTRICT ON UPDATE RESTRICT`,
    )
    await queryRunner.query(`ALTER TABLE \`alerts\` MODIFY \`taskId\` int NULL`)
    await queryRunner.query(`ALTER TABLE \`alerts\` ADD \`incidentId\` int NULL`)
    await queryRunner.query(`CREATE UNIQUE INDEX \`IDX_alerts_incident_kind\` ON \`alerts\` (\`incidentId\`, \`kind\`)`)
    await queryRunner.query(
      `ALTER TABLE \`alerts\` ADD CONSTRAINT \`FK_alerts_incidentId\` FOREIGN KEY (\`incidentId\`) REFERENCES \`incidents\`(\`id\`) ON DELETE RESTRICT ON UPDATE RESTRICT`,
    )
    await queryRunner.query(
      `UPDATE \`alerts\` a JOIN \`incidents\` i ON i.\`taskId\` = a.\`taskId\` SET a.\`incidentId\` = i.\`id\` WHERE a.\`kind\` LIKE 'incident%'`,
    )
    await queryRunner.query(
      `ALTER TABLE \`audit_log\` CHANGE \`entity\` \`entity\` enum ('routine', 'playbook', 'limit', 'ladder', 'shift', 'on_call', 'assignment', 'person', 'completion', 'event', 'facility', 'incident') NOT NULL`,
    )
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`DELETE FROM \`audit_log\` WHERE \`entity\` = 'incident'`)
    await queryRunner.query(
      `ALTER TABLE \`audit_log\` CHANGE \`entity\` \`entity\` enum ('routine', 'playbook', 'limit', 'ladder', 'shift', 'on_call', 'assignment', 'person', 'completion', 'event', 'facility') NOT NULL`,
    )
    // Their notifications go with them; a hand-filed incident's alerts have no task to belong to.
    await queryRunner.query(`DELETE n FROM \`notifications\` n JOIN \`alerts\` a ON a.\`id\` = n.\`alertId\` WHERE a.\`taskId\` IS NULL`)
    await queryRunner.query(`DELETE FROM \`alerts\` WHERE \`taskId\` IS NULL`)
    await queryRunner.query(`ALTER TABLE \`alerts\` DROP FOREIGN KEY \`FK_alerts_incidentId\``)
    await queryRunner.query(`DROP INDEX \`IDX_alerts_incident_kind\` ON \`alerts\``)
    await queryRunner.query(`ALTER TABLE \`alerts\` DROP COLUMN \`incidentId\``)
    await queryRunner.query(`ALTER TABLE \`alerts\` MODIFY \`taskId\` int NOT NULL`)
    await queryRunner.query(`ALTER TABLE \`incidents\` DROP FOREIGN KEY \`FK_incidents_filedById\``)
    await queryRunner.query(`ALTER TABLE \`incidents\` DROP COLUMN \`filedById\``)
  }
}
