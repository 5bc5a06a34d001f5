import { DataTypes, type ModelAttributeColumnOptions, type Model } from "sequelize";

/**
 * A TEXT column holding JSON, read and written as a value. SQLite has no JSON column type;
 * keeping the parse in one place means every model stores JSON the same way.
 */
export function jsonColumn(name: string, options: { allowNull?: boolean } = {}): ModelAttributeColumnOptions {
  return {
    type: DataTypes.TEXT,
    allowNull: options.allowNull ?? false,
    get(this: Model) {
      const raw = this.getDataValue(name) as string | null | undefined;
      return raw === null || raw === undefined ? null : (JSON.parse(raw) as unknown);
    },
    set(this: Model, value: unknown) {
      this.setDataValue(name, value === undefined || value === null ? null : JSON.stringify(value));
    },
  };
}
