import type { MigrationInterface, QueryRunner } from 'typeorm'

export class PushSubscriptions1796470100000 implements MigrationInterface {
  name = 'PushSubscriptions1796470100000'

  public async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(
      'CREATE TABLE `push_subscriptions` (`id` int NOT NULL AUTO_INCREMENT, `personId` int NOT NULL, `endpointHash` char(64) NOT NULL, `endpoint` varchar(1000) NOT NULL, `p256dh` varchar(200) NOT NULL, `auth` varchar(100) NOT NULL, `createdAt` datetime(3) NOT NULL, UNIQUE INDEX `IDX_push_subscriptions_endpoint` (`endpointHash`), INDEX `IDX_push_subscriptions_person` (`personId`), PRIMARY KEY (`id`)) ENGINE=InnoDB',
    )
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query('DROP TABLE `push_subscriptions`')
  }
}
