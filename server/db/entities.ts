import { PasswordReset } from '../auth/password-reset.entity';
import { Invite } from '../invites/invite.entity';
import { MailMessage } from '../mail/mail-message.entity';
import { Shop } from '../shops/shop.entity';
import { User } from '../users/user.entity';

export const entities = [Shop, User, Invite, PasswordReset, MailMessage];
