/** Every migration, in order. `npm run migration:generate -- <Name>` appends to this list. */
import { Foundation1796214609795 } from './1796214609795-foundation';
import { Workshop1796215191994 } from './1796215191994-workshop';
import { PublishedVersionsImmutable1796215191995 } from './1796215191995-published-versions-immutable';
import { DiagnosisPhotos1796218456203 } from './1796218456203-diagnosis-photos';
import { VersionNotes1796218508600 } from './1796218508600-version-notes';
import { ReplaysAndPractice1796218522859 } from './1796218522859-replays-and-practice';
import { ProcedurePictures1796224770693 } from './1796224770693-procedure-pictures';
import { SessionEpoch1796228549268 } from './1796228549268-session-epoch';

export const migrations = [Foundation1796214609795, Workshop1796215191994, PublishedVersionsImmutable1796215191995, DiagnosisPhotos1796218456203, VersionNotes1796218508600, ReplaysAndPractice1796218522859, ProcedurePictures1796224770693, SessionEpoch1796228549268];
