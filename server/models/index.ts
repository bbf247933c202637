import type { Sequelize } from 'sequelize';
import { CareWindow } from './care-window.model';
import { Group } from './group.model';
import { Invitation } from './invitation.model';
import { LogEntry } from './log-entry.model';
import { LogEntryPlant } from './log-entry-plant.model';
import { LogEntryWindow } from './log-entry-window.model';
import { Membership } from './membership.model';
import { OutboxMessage } from './outbox-message.model';
import { PasswordResetToken } from './password-reset-token.model';
import { Photo } from './photo.model';
import { Plant } from './plant.model';
import { ReminderPreference } from './reminder-preference.model';
import { Site } from './site.model';
import { SiteNormal } from './site-normal.model';
import { SiteReading } from './site-reading.model';
import { StoreBatch, StoreBatchPlant } from './store-batch.model';
import { User } from './user.model';

export { CareWindow, Group, Membership, OutboxMessage, PasswordResetToken, Plant, ReminderPreference, Site, SiteNormal, SiteReading, User };
export { Invitation, StoreBatch, StoreBatchPlant };

export { LogEntry, LogEntryPlant, LogEntryWindow, Photo };

// Define every model first, then associate, so no association refers to a model not yet initialised.
export function initModels(sequelize: Sequelize): void {
  for (const model of [User, Group, Membership, Site, Plant, PasswordResetToken, OutboxMessage, CareWindow, SiteReading, SiteNormal, ReminderPreference]) model.initModel(sequelize);
  for (const model of [Invitation, StoreBatch, StoreBatchPlant]) model.initModel(sequelize);
  for (const model of [LogEntry, LogEntryPlant, LogEntryWindow, Photo]) model.initModel(sequelize);

  Group.hasMany(Membership, { foreignKey: 'groupId', as: 'memberships' });
  Membership.belongsTo(Group, { foreignKey: 'groupId', as: 'group' });
  User.hasMany(Membership, { foreignKey: 'userId', as: 'memberships' });
  Membership.belongsTo(User, { foreignKey: 'userId', as: 'user' });
  Site.hasMany(Plant, { foreignKey: 'siteId', as: 'plants' });
  Plant.belongsTo(Site, { foreignKey: 'siteId', as: 'site' });
  Plant.hasMany(CareWindow, { foreignKey: 'plantId', as: 'careWindows' });
  CareWindow.belongsTo(Plant, { foreignKey: 'plantId', as: 'plant' });
}
