import type { Ref } from 'vue';
import type { PhotoDto } from '@shared/schemas/nursery.schema';
import { uploadPhoto } from '@/api/trees';
import { useAsyncAction } from './useAsyncAction';

/** One photo sent as soon as it is chosen, so the form can show its thumbnail and send only its id. */
export function usePhotoUpload(): { uploading: Ref<boolean>; error: Ref<string | null>; upload: (file: File) => Promise<PhotoDto | undefined> } {
  const { loading, error, run } = useAsyncAction(uploadPhoto, {
    payload_too_large: 'That photo is too large. Choose a smaller one.',
    validation_failed: 'That file is not a photo Ebbroot can read (JPEG, PNG or WebP).',
  });
  return { uploading: loading, error, upload: run };
}
