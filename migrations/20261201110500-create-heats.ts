import { DataTypes, type QueryInterface } from 'sequelize';

// One melt. Temperatures °C and masses g as exact numerics; figures such as
// yield, superheat and hold time are computed on read, never stored.
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.createTable('heats', {
    id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
    workshop_id: { type: DataTypes.UUID, allowNull: false, references: { model: 'workshops', key: 'id' }, onDelete: 'CASCADE' },
    // Erasing an account erases its own log; there is no account deletion yet.
    caster_id: { type: DataTypes.UUID, allowNull: false, references: { model: 'users', key: 'id' }, onDelete: 'CASCADE' },
    melt_started_at: { type: DataTypes.DATE, allowNull: true },
    poured_at: { type: DataTypes.DATE, allowNull: false },
    alloy: { type: DataTypes.STRING(60), allowNull: false },
    // A workshop's own alloy, once that table exists; no foreign key until then.
    workshop_alloy_id: { type: DataTypes.UUID, allowNull: true },
    furnace_id: { type: DataTypes.UUID, allowNull: true, references: { model: 'furnaces', key: 'id' }, onDelete: 'SET NULL' },
    crucible_id: { type: DataTypes.UUID, allowNull: true, references: { model: 'crucibles', key: 'id' }, onDelete: 'SET NULL' },
    setpoint_c: { type: DataTypes.DECIMAL, allowNull: true },
    peak_temp_c: { type: DataTypes.DECIMAL, allowNull: true },
    pour_temp_c: { type: DataTypes.DECIMAL, allowNull: true },
    flux_kind: { type: DataTypes.STRING(12), allowNull: false, defaultValue: 'none' },
    flux_amount_g: { type: DataTypes.DECIMAL, allowNull: true },
    degassing: { type: DataTypes.STRING(16), allowNull: false, defaultValue: 'none' },
    skimmed: { type: DataTypes.BOOLEAN, allowNull: true },
    tools_preheated: { type: DataTypes.BOOLEAN, allowNull: true },
    ambient_temp_c: { type: DataTypes.DECIMAL, allowNull: true },
    relative_humidity_pct: { type: DataTypes.DECIMAL, allowNull: true },
    crucible_remainder_g: { type: DataTypes.DECIMAL, allowNull: true },
    notes: { type: DataTypes.TEXT, allowNull: true },
    safety_dry_tools: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
    safety_ppe: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
    safety_clear_floor: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
    crucible_shock: { type: DataTypes.STRING(14), allowNull: false, defaultValue: 'none' },
    created_at: { type: DataTypes.DATE, allowNull: false },
    updated_at: { type: DataTypes.DATE, allowNull: false },
  });
  await qi.addIndex('heats', ['workshop_id', 'poured_at', 'id'], { name: 'heats_workshop_poured' });
  await qi.addIndex('heats', ['workshop_id', 'caster_id', 'poured_at'], { name: 'heats_workshop_caster' });
  await qi.addIndex('heats', ['furnace_id', 'poured_at'], { name: 'heats_furnace' });
  await qi.addIndex('heats', ['crucible_id', 'poured_at'], { name: 'heats_crucible' });
  await qi.sequelize.query(`
    ALTER TABLE heats
      ADD CONSTRAINT heats_flux_kind CHECK (flux_kind IN ('none','cover','drossing','cleaning','borax','other')),
      ADD CONSTRAINT heats_degassing CHECK (degassing IN ('none','argon_lance','nitrogen_lance','rotary','tablet','other')),
      ADD CONSTRAINT heats_crucible_shock CHECK (crucible_shock IN ('none','fast_heat_up','quenched')),
      ADD CONSTRAINT heats_times CHECK (melt_started_at IS NULL OR melt_started_at <= poured_at),
      ADD CONSTRAINT heats_humidity CHECK (relative_humidity_pct IS NULL OR relative_humidity_pct BETWEEN 0 AND 100),
      ADD CONSTRAINT heats_masses CHECK ((flux_amount_g IS NULL OR flux_amount_g >= 0) AND (crucible_remainder_g IS NULL OR crucible_remainder_g >= 0))`);
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.dropTable('heats');
}
