package org.rosetra.runtime.series;

/** Told how many bytes of the file have been read; may be called from several threads. */
@FunctionalInterface
public interface ProgressListener {

    ProgressListener NONE = (done, total) -> { };

    void progress(long bytesDone, long bytesTotal);
}
