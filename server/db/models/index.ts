import type { Sequelize } from 'sequelize';
import { initDesignModel } from './design';
import { initDesignRevisionModel } from './designRevision';
import { initSessionModel } from './session';
import { initUserModel } from './user';
import { initSharingModels } from './sharing';

export function defineModels(sequelize: Sequelize) {
  const User = initUserModel(sequelize);
  const Design = initDesignModel(sequelize);
  const DesignRevision = initDesignRevisionModel(sequelize);
  const Session = initSessionModel(sequelize);
  return { User, Design, DesignRevision, Session, ...initSharingModels(sequelize) };
}

export type Models = ReturnType<typeof defineModels>;
export { UserModel, ROLES, type Role, type Units, type UserPreferences } from './user';
export { DesignModel } from './design';
export { DesignRevisionModel } from './designRevision';
export { SessionModel } from './session';
