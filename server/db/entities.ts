import { PasswordReset } from '../auth/password-reset.entity';
import { DiagnosisStep } from '../diagnoses/diagnosis-step.entity';
import { Diagnosis } from '../diagnoses/diagnosis.entity';
import { IdempotencyRecord } from '../idempotency/idempotency-record.entity';
import { Invite } from '../invites/invite.entity';
import { Job } from '../jobs/job.entity';
import { Machine } from '../machines/machine.entity';
import { MailMessage } from '../mail/mail-message.entity';
import { Meter } from '../meters/meter.entity';
import { DiagnosisPhoto } from '../photos/photo.entity';
import { ProcedurePicture } from '../procedure-pictures/procedure-picture.entity';
import { ProcedureVersion } from '../procedures/procedure-version.entity';
import { Procedure } from '../procedures/procedure.entity';
import { PracticeAttempt } from '../replays/practice-attempt.entity';
import { StepComment } from '../replays/step-comment.entity';
import { Shop } from '../shops/shop.entity';
import { User } from '../users/user.entity';

export const entities = [Shop, User, Invite, PasswordReset, MailMessage, Machine, Job, Meter, Procedure, ProcedureVersion, Diagnosis, DiagnosisStep, IdempotencyRecord, DiagnosisPhoto, StepComment, PracticeAttempt, ProcedurePicture];
