// Registers every model and association on a Sequelize instance. lib/db.ts calls it when it loads and
// whenever it opens a new instance, so code that uses a model never has to ask for the instance first.
import type { Sequelize } from 'sequelize';
import { Enclosure } from './enclosure';
import { Invitation } from './invitation';
import { Membership } from './membership';
import { Organisation } from './organisation';
import { EndedSession } from './ended-session';
import { AccountLink } from './account-link';
import { SignInAttempt } from './sign-in-attempt';
import { User } from './user';
import { Design } from './design';
import { ShareLink } from './share-link';
import { Variant } from './variant';
import { CatalogueSeeding } from './catalogue-seeding';
import { LampType } from './lamp-type';
import { LampCurveAdoption } from './lamp-curve-adoption';
import { SpeciesSheet } from './species';
import { Lamp } from './lamp';
import { LampOutlook } from './lamp-outlook';
import { LampReminder } from './lamp-reminder';
import { registerOutlookInvalidation } from './outlook-invalidation';
import { MailMessage } from './mail-message';
import { Reading } from './reading';
import { Upload } from './upload';
import { JobRun, JobRunCount, JobUnit } from './job-run';
import { Customer } from './customer';
import { CounterLamp, CounterReading } from './counter-lamp';

const initialised = new WeakSet<Sequelize>();

/** Registers every model and association on this instance, once. */
export function initModels(sequelize: Sequelize): void {
  if (initialised.has(sequelize)) return;
  initialised.add(sequelize);
  Organisation.register(sequelize);
  User.register(sequelize);
  Membership.register(sequelize);
  Invitation.register(sequelize);
  Enclosure.register(sequelize);
  Design.register(sequelize);
  Variant.register(sequelize);
  ShareLink.register(sequelize);
  SignInAttempt.register(sequelize);
  EndedSession.register(sequelize);
  AccountLink.register(sequelize);
  SpeciesSheet.register(sequelize);
  LampType.register(sequelize);
  LampCurveAdoption.register(sequelize);
  CatalogueSeeding.register(sequelize);
  Lamp.register(sequelize);
  Reading.register(sequelize);
  Customer.register(sequelize);
  CounterLamp.register(sequelize);
  CounterReading.register(sequelize);
  Upload.register(sequelize);
  MailMessage.register(sequelize);
  LampReminder.register(sequelize);
  JobRun.register(sequelize);
  JobRunCount.register(sequelize);
  JobUnit.register(sequelize);
  LampOutlook.register(sequelize);

  Organisation.hasMany(Membership, { foreignKey: 'organisationId', as: 'memberships' });
  Membership.belongsTo(Organisation, { foreignKey: 'organisationId', as: 'organisation' });
  User.hasMany(Membership, { foreignKey: 'userId', as: 'memberships' });
  Membership.belongsTo(User, { foreignKey: 'userId', as: 'user' });
  Invitation.belongsTo(Organisation, { foreignKey: 'organisationId', as: 'organisation' });
  Enclosure.belongsTo(Organisation, { foreignKey: 'organisationId', as: 'organisation' });
  Enclosure.belongsTo(User, { foreignKey: 'keeperId', as: 'keeper' });
  Enclosure.hasMany(Design, { foreignKey: 'enclosureId', as: 'designs' });
  Design.belongsTo(Enclosure, { foreignKey: 'enclosureId', as: 'enclosure' });
  Design.hasMany(Variant, { foreignKey: 'designId', as: 'variants' });
  Variant.belongsTo(Design, { foreignKey: 'designId', as: 'design' });
  Variant.belongsTo(User, { foreignKey: 'updatedById', as: 'updatedBy' });
  Variant.hasMany(ShareLink, { foreignKey: 'variantId', as: 'shareLinks' });
  ShareLink.belongsTo(Variant, { foreignKey: 'variantId', as: 'variant' });
  Organisation.hasMany(SpeciesSheet, { foreignKey: 'organisationId', as: 'speciesSheets' });
  SpeciesSheet.belongsTo(Organisation, { foreignKey: 'organisationId', as: 'organisation' });
  Organisation.hasMany(LampType, { foreignKey: 'organisationId', as: 'lampTypes' });
  LampType.belongsTo(Organisation, { foreignKey: 'organisationId', as: 'organisation' });
  // Counter tests: a customer's lamps and their readings.
  Customer.hasMany(CounterLamp, { foreignKey: 'customerId', as: 'counterLamps' });
  CounterLamp.belongsTo(Customer, { foreignKey: 'customerId', as: 'customer' });
  CounterLamp.belongsTo(LampType, { foreignKey: 'lampTypeId', as: 'lampType' });
  CounterLamp.belongsTo(SpeciesSheet, { foreignKey: 'speciesSheetId', as: 'speciesSheet' });
  CounterLamp.hasMany(CounterReading, { foreignKey: 'counterLampId', as: 'readings' });
  CounterReading.belongsTo(CounterLamp, { foreignKey: 'counterLampId', as: 'lamp' });

  // Lamp log.
  Enclosure.hasMany(Lamp, { foreignKey: 'enclosureId', as: 'lamps' });
  Lamp.belongsTo(Enclosure, { foreignKey: 'enclosureId', as: 'enclosure' });
  Lamp.belongsTo(LampType, { foreignKey: 'lampTypeId', as: 'lampType' });
  Lamp.hasMany(Reading, { foreignKey: 'lampId', as: 'readings' });
  Reading.belongsTo(Lamp, { foreignKey: 'lampId', as: 'lamp' });
  Upload.belongsTo(Enclosure, { foreignKey: 'enclosureId', as: 'enclosure' });
  Lamp.hasOne(LampOutlook, { foreignKey: 'lampId', as: 'outlook' });
  LampOutlook.belongsTo(Lamp, { foreignKey: 'lampId', as: 'lamp' });
  registerOutlookInvalidation();
}
