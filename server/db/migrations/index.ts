import type { QueryInterface } from 'sequelize';
import type { RunnableMigration } from 'umzug';
import * as createUsers from './0001-create-users';
import * as createSessions from './0002-create-sessions';
import * as createDesigns from './0003-create-designs';
import * as designRevisionCounts from './0004-design-revision-counts';
import * as createLinksAndClasses from './0010-create-links-and-classes';
import * as createReviews from './0011-create-reviews';
import * as createPasswordResets from './0012-create-password-resets';
import * as createUploads from './0013-create-uploads';
import * as createBuilds from './0020-create-builds';
import * as createBuildProgress from './0021-create-build-progress';

/**
 * Every migration, in number order. Listed by import rather than found by glob so the same list
 * works under tsx, Vitest and any bundler. Never edit one that has shipped. Umzug records applied
 * migrations by name, so a database migrated under an older listing order only runs what it lacks.
 */
export const migrations: RunnableMigration<QueryInterface>[] = [
  { name: '0001-create-users', ...createUsers },
  { name: '0002-create-sessions', ...createSessions },
  { name: '0003-create-designs', ...createDesigns },
  { name: '0004-design-revision-counts', ...designRevisionCounts },
  { name: '0010-create-links-and-classes', ...createLinksAndClasses },
  { name: '0011-create-reviews', ...createReviews },
  { name: '0012-create-password-resets', ...createPasswordResets },
  { name: '0013-create-uploads', ...createUploads },
  { name: '0020-create-builds', ...createBuilds },
  { name: '0021-create-build-progress', ...createBuildProgress },
];
