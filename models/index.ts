import type { Sequelize } from 'sequelize';
import { Enclosure } from './enclosure';
import { Invitation } from './invitation';
import { Membership } from './membership';
import { Organisation } from './organisation';
import { SignInAttempt } from './sign-in-attempt';
import { User } from './user';

export { Enclosure, Invitation, Membership, Organisation, User };
export { SignInAttempt };
export { ROLES, type Role } from './membership';

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
  SignInAttempt.register(sequelize);

  Organisation.hasMany(Membership, { foreignKey: 'organisationId', as: 'memberships' });
  Membership.belongsTo(Organisation, { foreignKey: 'organisationId', as: 'organisation' });
  User.hasMany(Membership, { foreignKey: 'userId', as: 'memberships' });
  Membership.belongsTo(User, { foreignKey: 'userId', as: 'user' });
  Invitation.belongsTo(Organisation, { foreignKey: 'organisationId', as: 'organisation' });
  Enclosure.belongsTo(Organisation, { foreignKey: 'organisationId', as: 'organisation' });
  Enclosure.belongsTo(User, { foreignKey: 'keeperId', as: 'keeper' });
}
