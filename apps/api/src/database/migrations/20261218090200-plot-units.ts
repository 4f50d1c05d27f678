import { QueryTypes, type QueryInterface } from 'sequelize';

// Split plots: each plot records its whole plot (within the block), its sub plot (within the whole plot) and, in a
// split-split plot, its sub-sub plot (within the sub plot); null for the other designs. Labels such as
// QHA-B12-W12-S12-SS12 need more than 20 characters.
export async function up({ context: queryInterface }: { context: QueryInterface }): Promise<void> {
  await queryInterface.sequelize.query(
    'ALTER TABLE `plots` MODIFY `label` VARCHAR(32) NOT NULL, ' +
      'ADD COLUMN `whole_plot` SMALLINT UNSIGNED NULL AFTER `position`, ' +
      'ADD COLUMN `sub_plot` SMALLINT UNSIGNED NULL AFTER `whole_plot`, ' +
      'ADD COLUMN `sub_sub_plot` SMALLINT UNSIGNED NULL AFTER `sub_plot`',
    { type: QueryTypes.RAW },
  );
}

export async function down({ context: queryInterface }: { context: QueryInterface }): Promise<void> {
  await queryInterface.sequelize.query(
    'ALTER TABLE `plots` DROP COLUMN `sub_sub_plot`, DROP COLUMN `sub_plot`, DROP COLUMN `whole_plot`, MODIFY `label` VARCHAR(20) NOT NULL',
    { type: QueryTypes.RAW },
  );
}
