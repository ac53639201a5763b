import type { MachineView } from '@shared/api/workshop-types';

/** "2016 Veltro Tessa 650" */
export const machineName = (m: Pick<MachineView, 'year' | 'make' | 'model'>) => `${m.year} ${m.make} ${m.model}`;
