import type { MeterRange } from '../workshop/schemas';

export interface MachineView {
  id: string;
  make: string;
  model: string;
  year: number;
  engine: string;
  vin: string;
  mileage: number | null;
  mileageUnit: 'km' | 'mi';
  /** Set when the VIN's structure or North American check digit looks wrong; never blocks anything. */
  vinWarning: string | null;
  createdAt: string;
}

export interface JobView {
  id: string;
  reference: string;
  customerName: string;
  customerContact: string;
  customerEmail: string;
  complaint: string;
  machine: MachineView;
  createdAt: string;
}

/** A job as the bench's job list shows it. */
export interface JobListItem extends JobView {
  /** When the job's latest concluded diagnosis ended; null while none has concluded. */
  concludedAt: string | null;
}

export interface MeterView {
  id: string;
  name: string;
  model: string;
  ranges: MeterRange[];
  createdAt: string;
}
