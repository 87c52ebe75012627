// Importing any model through this index loads lib/db, which registers them all on the process's
// Sequelize instance: a model is ready to query wherever it is imported.
import '@/lib/db';
import { Enclosure } from './enclosure';
import { Invitation } from './invitation';
import { Membership } from './membership';
import { Organisation } from './organisation';
import { EndedSession } from './ended-session';
import { AccountLink, LINK_PURPOSES, type LinkPurpose } from './account-link';
import { SignInAttempt } from './sign-in-attempt';
import { User } from './user';
import { Design } from './design';
import { ShareLink } from './share-link';
import { Variant } from './variant';
import { CatalogueSeeding } from './catalogue-seeding';
import { LampType } from './lamp-type';
import { SpeciesSheet } from './species';
import { Lamp } from './lamp';
import { LampOutlook } from './lamp-outlook';
import { LampReminder } from './lamp-reminder';
import { MailMessage } from './mail-message';
import { Reading } from './reading';
import { Upload } from './upload';
import { JobRun, JobRunCount, JobUnit } from './job-run';
import { Customer } from './customer';
import { CounterLamp, CounterReading } from './counter-lamp';

export { Enclosure, Invitation, Membership, Organisation, User };
export { Design, ShareLink, Variant };
export { AccountLink, EndedSession, SignInAttempt };
export { LINK_PURPOSES, type LinkPurpose };
export { CatalogueSeeding, LampType, SpeciesSheet };
export { Lamp, LampOutlook, LampReminder, MailMessage, Reading, Upload };
export { JobRun, JobRunCount, JobUnit };
export { Customer, CounterLamp, CounterReading };
export { parseCounts, type JobCounts, type JobOutcome } from './job-run';
export { ROLES, type Role } from './membership';
export { initModels } from './register';
