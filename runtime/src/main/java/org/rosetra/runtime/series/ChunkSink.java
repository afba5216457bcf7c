package org.rosetra.runtime.series;

/** Takes chunks in file order; returns false to stop reading early (e.g. past a zero window). */
@FunctionalInterface
public interface ChunkSink {
    boolean accept(Chunk chunk);
}
