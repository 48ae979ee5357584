import { Button } from '@/components/ui/button';
import { Banner } from '@/components/ui/banner';
import { ErrorBanner } from '@/components/ui/error-banner';
import { Loading } from '@/components/ui/spinner';
import { useKeptPlayback } from '../player/use-kept-playback';

/**
 * A preview of the web version with its captions. Storage URLs are short-lived: they are renewed before
 * they expire or when the video reports an error, and playback continues at the same moment.
 */
export function RecordingPlayer({ recordingId, title }: { recordingId: string; title: string }) {
  const { playback, stuck, videoRef, onError, onLoadedMetadata, tryAgain } = useKeptPlayback(recordingId);
  if (playback.isPending) return <Loading label="Preparing the preview…" />;
  if (playback.isError && !playback.data) return <ErrorBanner error={playback.error} title="The preview could not be loaded" />;
  const data = playback.data;
  if (!data) return null;
  return (
    <div className="flex flex-col gap-3">
      <video
        ref={videoRef}
        controls
        preload="metadata"
        src={data.src.url}
        poster={data.posterUrl ?? undefined}
        onError={onError}
        onLoadedMetadata={onLoadedMetadata}
        aria-label={`Preview of ${title}`}
        className="aspect-video w-full rounded-lg bg-ink"
      >
        {data.captions.map((caption) => (
          <track
            key={caption.id}
            kind="captions"
            src={caption.url}
            srcLang={caption.language}
            label={caption.label}
            default={caption.isDefault}
          />
        ))}
      </video>
      {stuck ? (
        <Banner tone="error" title="The video does not play">
          <p>Even with fresh links the browser could not play it. Check the connection, then try again.</p>
          <Button size="sm" variant="secondary" className="mt-2" onClick={tryAgain}>
            Try again
          </Button>
        </Banner>
      ) : null}
      {playback.isError && playback.data ? (
        <ErrorBanner error={playback.error} title="Fresh links for the video could not be fetched" />
      ) : null}
    </div>
  );
}
