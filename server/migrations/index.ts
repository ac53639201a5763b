/** Every migration, in order. `npm run migration:generate -- <Name>` appends to this list. */
import { Foundation1796214609795 } from './1796214609795-foundation';

export const migrations = [Foundation1796214609795];
