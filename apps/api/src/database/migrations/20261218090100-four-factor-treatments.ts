import { QueryTypes, type QueryInterface } from 'sequelize';

// A treatment of a 3- or 4-factor trial is a combination of up to four levels, its code the level codes joined
// (up to 4 × 6 characters). Down narrows the code back to 12 characters: it fails while a longer code exists,
// which is the safe answer (delete those trials' factors first).
export async function up({ context: queryInterface }: { context: QueryInterface }): Promise<void> {
  await queryInterface.sequelize.query(
    'ALTER TABLE `treatments` MODIFY `code` VARCHAR(24) NOT NULL, ' +
      'ADD COLUMN `factor_level_c_id` INT UNSIGNED NULL AFTER `factor_level_b_id`, ' +
      'ADD COLUMN `factor_level_d_id` INT UNSIGNED NULL AFTER `factor_level_c_id`, ' +
      'ADD CONSTRAINT `treatments_factor_level_c` FOREIGN KEY (`factor_level_c_id`) REFERENCES `factor_levels` (`id`) ON DELETE SET NULL ON UPDATE CASCADE, ' +
      'ADD CONSTRAINT `treatments_factor_level_d` FOREIGN KEY (`factor_level_d_id`) REFERENCES `factor_levels` (`id`) ON DELETE SET NULL ON UPDATE CASCADE',
    { type: QueryTypes.RAW },
  );
}

export async function down({ context: queryInterface }: { context: QueryInterface }): Promise<void> {
  await queryInterface.sequelize.query('ALTER TABLE `treatments` DROP FOREIGN KEY `treatments_factor_level_c`, DROP FOREIGN KEY `treatments_factor_level_d`', {
    type: QueryTypes.RAW,
  });
  await queryInterface.sequelize.query(
    'ALTER TABLE `treatments` DROP COLUMN `factor_level_d_id`, DROP COLUMN `factor_level_c_id`, MODIFY `code` VARCHAR(12) NOT NULL',
    { type: QueryTypes.RAW },
  );
}
