import type { S3rverFilesystemStore } from 's3rver';

/**
 * s3rver's DeleteObjects deletes its keys in parallel, and each deletion then removes the emptied
 * parent folders; two keys of one folder race there (ENOENT from readdir/rmdir, or ENOTEMPTY) and the
 * whole request answered 500, which the API would take for "storage is down". The object's files are
 * already unlinked by then, so such a tidy-up failure is no failure of the delete.
 */
export function tolerateConcurrentDeletes(store: S3rverFilesystemStore): void {
  const deleteObject = store.deleteObject.bind(store);
  store.deleteObject = async (bucket, key) => {
    try {
      await deleteObject(bucket, key);
    } catch (error) {
      const code = (error as NodeJS.ErrnoException).code;
      if (code !== 'ENOENT' && code !== 'ENOTEMPTY') throw error;
    }
  };
}
