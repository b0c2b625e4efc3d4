import type { ModelStatic, Sequelize } from 'sequelize';
import {
  defineBuildCompletion,
  defineBuildMark,
  defineBuildPhoto,
  defineBuildStepMark,
  type BuildCompletionRow,
  type BuildMarkRow,
  type BuildPhotoRow,
  type BuildStepMarkRow,
} from './build-record';
import { defineChapSecret, defineSecretReveal, type ChapSecretRow, type SecretRevealRow } from './chap-secret';
import { defineDesign, type DesignRow } from './design';
import { defineDesignVersion, type DesignVersionRow } from './design-version';
import { defineInvitation, type InvitationRow } from './invitation';
import { defineSession, type SessionRow } from './session';
import { defineTeam, type TeamRow } from './team';
import { defineReviewEvent, type ReviewEventRow } from './review-event';
import { defineUser, type UserRow } from './user';

export type { ChapSecretRow, SecretRevealRow };
export type { BuildCompletionRow, BuildMarkRow, BuildPhotoRow, BuildStepMarkRow, DesignRow, DesignVersionRow, InvitationRow, ReviewEventRow, SessionRow, TeamRow, UserRow };

export type Models = {
  Team: ModelStatic<TeamRow>;
  User: ModelStatic<UserRow>;
  Invitation: ModelStatic<InvitationRow>;
  Session: ModelStatic<SessionRow>;
  Design: ModelStatic<DesignRow>;
  DesignVersion: ModelStatic<DesignVersionRow>;
  ReviewEvent: ModelStatic<ReviewEventRow>;
  BuildMark: ModelStatic<BuildMarkRow>;
  BuildStepMark: ModelStatic<BuildStepMarkRow>;
  BuildPhoto: ModelStatic<BuildPhotoRow>;
  BuildCompletion: ModelStatic<BuildCompletionRow>;
  ChapSecret: ModelStatic<ChapSecretRow>;
  SecretReveal: ModelStatic<SecretRevealRow>;
};

const cache = new WeakMap<Sequelize, Models>();

/**
 * The models bound to one Sequelize instance (each test has its own in-memory database, so models are
 * defined per instance rather than as global classes). Tables come from migrations, never from sync().
 */
export function getModels(sequelize: Sequelize): Models {
  const known = cache.get(sequelize);
  if (known) return known;
  const models: Models = {
    Team: defineTeam(sequelize),
    User: defineUser(sequelize),
    Invitation: defineInvitation(sequelize),
    Session: defineSession(sequelize),
    Design: defineDesign(sequelize),
    DesignVersion: defineDesignVersion(sequelize),
    ReviewEvent: defineReviewEvent(sequelize),
    BuildMark: defineBuildMark(sequelize),
    BuildStepMark: defineBuildStepMark(sequelize),
    BuildPhoto: defineBuildPhoto(sequelize),
    BuildCompletion: defineBuildCompletion(sequelize),
    ChapSecret: defineChapSecret(sequelize),
    SecretReveal: defineSecretReveal(sequelize),
  };
  models.Team.hasMany(models.User, { foreignKey: 'teamId', as: 'members' });
  models.User.belongsTo(models.Team, { foreignKey: 'teamId', as: 'team' });
  models.Invitation.belongsTo(models.Team, { foreignKey: 'teamId', as: 'team' });
  models.Invitation.belongsTo(models.User, { foreignKey: 'invitedById', as: 'invitedBy' });
  cache.set(sequelize, models);
  return models;
}
