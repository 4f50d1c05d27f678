import { QueryTypes, type QueryInterface } from 'sequelize';

// Factor levels carry their own rate and material (a level of a factorial or split-plot trial is what is applied),
// and factor positions go up to 4 (factorials of 2–4 factors; a split plot's factors from the whole plot down).
const columns = [
  'ADD COLUMN `description` TEXT NULL',
  'ADD COLUMN `rate_value` DECIMAL(14,4) NULL',
  'ADD COLUMN `rate_unit` VARCHAR(16) NULL',
  "ADD COLUMN `rate_basis` VARCHAR(16) NOT NULL DEFAULT 'area'",
  'ADD COLUMN `incorporation_depth_cm` DECIMAL(8,2) NULL',
  'ADD COLUMN `product` VARCHAR(200) NULL',
  'ADD COLUMN `purity` DECIMAL(7,6) NULL',
  "ADD COLUMN `moisture_basis` VARCHAR(8) NOT NULL DEFAULT 'as-is'",
  'ADD COLUMN `moisture_fraction` DECIMAL(7,6) NULL',
  "ADD COLUMN `material_kind` VARCHAR(12) NOT NULL DEFAULT 'other'",
];
const names = ['description', 'rate_value', 'rate_unit', 'rate_basis', 'incorporation_depth_cm', 'product', 'purity', 'moisture_basis', 'moisture_fraction', 'material_kind'];

// One ALTER with an explicit query type each way: addColumn/removeColumn's untyped queries trip over the mariadb driver's result meta.
export async function up({ context: queryInterface }: { context: QueryInterface }): Promise<void> {
  await queryInterface.sequelize.query(`ALTER TABLE \`factor_levels\` ${columns.join(', ')}`, { type: QueryTypes.RAW });
}

export async function down({ context: queryInterface }: { context: QueryInterface }): Promise<void> {
  await queryInterface.sequelize.query(`ALTER TABLE \`factor_levels\` ${names.map((name) => `DROP COLUMN \`${name}\``).join(', ')}`, { type: QueryTypes.RAW });
}
