import type { QueryInterface } from 'sequelize';

/**
 * Every measurement and setting column becomes DOUBLE. FLOAT keeps about seven significant digits and
 * mariadb-dump writes it with six, so a backup and restore quietly changed computed values (a lamp's
 * remaining output, a calibrated output) in their last digit; DOUBLE round-trips exactly.
 */
const COLUMNS: Record<string, string[]> = {
  enclosures: ['width_cm', 'height_cm', 'depth_cm'],
  species_sheets: [
    'uvb_target_min_uw',
    'uvb_target_max_uw',
    'basking_surface_min_c',
    'basking_surface_max_c',
    'warm_air_min_c',
    'warm_air_max_c',
    'cool_air_min_c',
    'cool_air_max_c',
    'night_min_c',
    'photoperiod_min_h',
    'photoperiod_max_h',
    'adult_length_cm',
  ],
  lamp_types: [
    'length_cm',
    'uvb_at30',
    'uvi_per_uvb',
    'radiant_fraction',
    'beam_deg',
    'reflector_gain',
    'watts',
    'half_life_months',
    'replace_after_months',
  ],
  lamps: ['hours_per_day', 'basking_distance_cm', 'basking_transmission'],
  readings: ['distance_cm', 'value'],
  lamp_outlooks: ['remaining_fraction'],
};

type Column = { IS_NULLABLE: string; COLUMN_DEFAULT: string | null };

async function retype(qi: QueryInterface, to: 'DOUBLE' | 'FLOAT') {
  for (const [table, columns] of Object.entries(COLUMNS)) {
    for (const column of columns) {
      const [rows] = (await qi.sequelize.query(
        `SELECT IS_NULLABLE, COLUMN_DEFAULT FROM information_schema.COLUMNS
          WHERE TABLE_SCHEMA = DATABASE() AND TABLE_NAME = ? AND COLUMN_NAME = ?`,
        { replacements: [table, column] },
      )) as [Column[], unknown];
      const c = rows[0];
      if (!c) throw new Error(`column ${table}.${column} is missing`);
      const nullable = c.IS_NULLABLE === 'YES' ? 'NULL' : 'NOT NULL';
      // information_schema gives a default as SQL text ('NULL' for none that is nullable).
      const fallback =
        c.COLUMN_DEFAULT === null || c.COLUMN_DEFAULT === 'NULL' ? '' : ` DEFAULT ${c.COLUMN_DEFAULT}`;
      await qi.sequelize.query(`ALTER TABLE \`${table}\` MODIFY \`${column}\` ${to} ${nullable}${fallback}`);
    }
  }
}

export async function up({ context: qi }: { context: QueryInterface }) {
  await retype(qi, 'DOUBLE');
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await retype(qi, 'FLOAT');
}
