import type { Sequelize } from 'sequelize';
import { initBuildModels } from './build';
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
  const { Build, BuildAssignee, BuildStateChange, BuildProgress } = initBuildModels(sequelize);
  return { User, Design, DesignRevision, Session, Build, BuildAssignee, BuildStateChange, BuildProgress, ...initSharingModels(sequelize) };
}

export type Models = ReturnType<typeof defineModels>;
export { UserModel, ROLES, type Role, type Units, type UserPreferences } from './user';
export { DesignModel } from './design';
export { DesignRevisionModel } from './designRevision';
export { SessionModel } from './session';
export { BuildModel, BUILD_STATES, PROGRESS_KINDS, type BuildState, type ProgressKind } from './build';
