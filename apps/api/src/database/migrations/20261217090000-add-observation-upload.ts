import { DataTypes, QueryTypes, type QueryInterface } from 'sequelize';

// Which upload last wrote a value (null after an edit in the Ledger). Intake writes a whole file's
// values with one bulk statement and then records their history in one statement too, finding
// them by this column within the round. No foreign key and no index of its own: the lookup runs
// inside the round's index, and a key would cost every bulk insert a check per row.
export async function up({ context: queryInterface }: { context: QueryInterface }): Promise<void> {
  await queryInterface.addColumn('observations', 'upload_id', { type: DataTypes.INTEGER.UNSIGNED, allowNull: true });
}

export async function down({ context: queryInterface }: { context: QueryInterface }): Promise<void> {
  // An explicit query type: removeColumn's untyped query trips over the mariadb driver's result meta.
  await queryInterface.sequelize.query('ALTER TABLE observations DROP COLUMN upload_id', { type: QueryTypes.RAW });
}
