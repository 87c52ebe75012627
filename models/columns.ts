// A model lists each column once, as a column built here: the definition Sequelize is given and the type
// of the instance field both come from that one line, so the two can never disagree (a field typed
// `string | null` whose column refuses null, a column the class forgot to declare).
import {
  DataTypes,
  Model,
  type DataType,
  type InitOptions,
  type ModelAttributeColumnOptions,
  type ModelAttributes,
  type ModelStatic,
  type Sequelize,
} from 'sequelize';

/**
 * One column: `definition` is what Sequelize is given; `T` (what the instance field holds) and
 * `OnCreate` ('optional' when a create may leave it out because the database or Sequelize fills it) exist
 * only as types. A nullable column may always be left out of a create: it is stored as null.
 */
export class Column<T, OnCreate extends 'optional' | 'required' = 'required'> {
  /** Type-only markers: never assigned, read by the types below. */
  declare readonly holds: T;
  declare readonly onCreate: OnCreate;

  constructor(readonly definition: ModelAttributeColumnOptions) {}

  /** The column may hold null. */
  nullable(): Column<T | null, OnCreate> {
    return new Column({ ...this.definition, allowNull: true });
  }

  /** A create that leaves it out stores `value` (Sequelize fills it in, as the table's own default would). */
  defaultsTo(value: T): Column<T, 'optional'> {
    return new Column({ ...this.definition, defaultValue: value });
  }

  unique(): Column<T, OnCreate> {
    return new Column({ ...this.definition, unique: true });
  }

  primaryKey(): Column<T, OnCreate> {
    return new Column({ ...this.definition, primaryKey: true });
  }

  /** A narrower type for the field than the column's own (a string column that holds one of a few words). */
  as<U extends T>(): Column<U, OnCreate> {
    return this as unknown as Column<U, OnCreate>;
  }
}

const column = <T>(type: DataType) => new Column<T>({ type, allowNull: false });

/** The table's own auto-increment id. */
export const id = () =>
  new Column<number, 'optional'>({ type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true });
/** The id of a row in another table. */
export const ref = () => column<number>(DataTypes.INTEGER.UNSIGNED);
/** A whole number from 0 up (a count, a version). */
export const unsigned = ref;
export const smallUnsigned = () => column<number>(DataTypes.TINYINT.UNSIGNED);
export const double = () => column<number>(DataTypes.DOUBLE);
export const boolean = () => column<boolean>(DataTypes.BOOLEAN);
/** VARCHAR of at most `length` characters. */
export const string = (length: number) => column<string>(DataTypes.STRING(length));
export const char = (length: number) => column<string>(DataTypes.CHAR(length));
export const text = (size?: 'medium' | 'long') =>
  column<string>(size ? DataTypes.TEXT(size) : DataTypes.TEXT);
/** A moment; `precision` 3 keeps milliseconds. */
export const date = (precision?: 3) => column<Date>(precision ? DataTypes.DATE(precision) : DataTypes.DATE);
/** A calendar date, read and written as YYYY-MM-DD. */
export const dateOnly = () => column<string>(DataTypes.DATEONLY);
export const oneOf = <V extends string>(values: readonly V[]) => column<V>(DataTypes.ENUM(...values));

/** A timestamp Sequelize writes itself (`createdAt`, `updatedAt`). */
export const timestamp = () => new Column<Date, 'optional'>({ type: DataTypes.DATE });
export const timestamps = () => ({ createdAt: timestamp(), updatedAt: timestamp() });
/** Who made the row and who last changed it: null once that user is removed (the row stays). */
export const authorship = () => ({ createdById: ref().nullable(), updatedById: ref().nullable() });

type Columns = Record<string, Column<unknown, 'optional' | 'required'>>;

/** The fields an instance of a table of these columns has. */
export type AttributesOf<C extends Columns> = { [K in keyof C]: C[K]['holds'] };

type OptionalKeys<C extends Columns> = {
  [K in keyof C]: C[K]['onCreate'] extends 'optional' ? K : never;
}[keyof C];

/** What a create must give (Sequelize itself makes the nullable ones optional too). */
export type CreationOf<C extends Columns> = Omit<AttributesOf<C>, OptionalKeys<C>> &
  Partial<Pick<AttributesOf<C>, OptionalKeys<C>>>;

/** The base class a table's model extends: its statics, typed instances, and `register`. */
export type TableModel<C extends Columns> = ModelStatic<
  Model<AttributesOf<C>, CreationOf<C>> & AttributesOf<C>
> & {
  /** Defines the model on this Sequelize instance (models/register.ts calls it for every model). */
  register(sequelize: Sequelize): void;
};

/**
 * The base class of the model of `tableName`: `class Lamp extends table('lamps', { … }) {}`. Its instances
 * carry one typed field a column; statics (`findAll`, `create` …) are Sequelize's, typed by the columns.
 */
export function table<C extends Columns>(
  tableName: string,
  columns: C,
  options: Omit<InitOptions, 'sequelize' | 'tableName'> = {},
): TableModel<C> {
  class Table extends Model {
    static register(sequelize: Sequelize) {
      // Sequelize writes into the definitions it is given, so each registration gets its own copies.
      const definitions = Object.fromEntries(
        Object.entries(columns).map(([name, c]) => [name, { ...c.definition }]),
      ) as ModelAttributes;
      this.init(definitions, { ...options, sequelize, tableName });
    }
  }
  return Table as unknown as TableModel<C>;
}
