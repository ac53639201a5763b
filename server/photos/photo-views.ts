import type { PhotoView } from '@shared/api/diagnosis-types';
import type { DiagnosisPhoto } from './photo.entity';

export const toPhotoView = (p: DiagnosisPhoto): PhotoView => ({
  id: p.id,
  stepId: p.stepId,
  contentType: p.contentType,
  size: p.size,
  createdAt: p.createdAt.toISOString(),
});
