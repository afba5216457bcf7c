package org.rosetra.lang.plan;

import java.util.Arrays;

/**
 * A history kept small enough to plot whatever its length: the smallest and largest value of
 * each block of consecutive samples, with their times. Blocks double in size as the history
 * grows, so memory stays bounded while every peak and trough survives.
 */
public final class Decimation {
    /** Blocks kept before neighbours are merged two by two. */
    private static final int MAX_BLOCKS = 8192;

    private double[] tMin = new double[64];
    private double[] vMin = new double[64];
    private double[] tMax = new double[64];
    private double[] vMax = new double[64];
    private int blocks;
    private int blockSize = 8;
    private int inBlock;

    void add(double[] values, double[] time, int n) {
        for (int i = 0; i < n; i++) {
            double v = values[i];
            if (Double.isNaN(v)) {
                continue;
            }
            if (inBlock == 0) {
                grow();
                tMin[blocks] = time[i];
                vMin[blocks] = v;
                tMax[blocks] = time[i];
                vMax[blocks] = v;
                blocks++;
            } else {
                int b = blocks - 1;
                if (v < vMin[b]) {
                    vMin[b] = v;
                    tMin[b] = time[i];
                }
                if (v > vMax[b]) {
                    vMax[b] = v;
                    tMax[b] = time[i];
                }
            }
            if (++inBlock == blockSize) {
                inBlock = 0;
                if (blocks >= MAX_BLOCKS) {
                    halve();
                }
            }
        }
    }

    /** Adds the blocks of a later part of the same history. */
    void append(Decimation later) {
        for (int b = 0; b < later.blocks; b++) {
            grow();
            tMin[blocks] = later.tMin[b];
            vMin[blocks] = later.vMin[b];
            tMax[blocks] = later.tMax[b];
            vMax[blocks] = later.vMax[b];
            blocks++;
        }
        inBlock = 0;
        while (blocks > 2 * MAX_BLOCKS) {
            halve();
        }
    }

    /** The kept points in time order: each block's minimum and maximum. */
    double[][] points() {
        double[] t = new double[2 * blocks];
        double[] v = new double[2 * blocks];
        for (int b = 0; b < blocks; b++) {
            boolean minFirst = tMin[b] <= tMax[b];
            t[2 * b] = minFirst ? tMin[b] : tMax[b];
            v[2 * b] = minFirst ? vMin[b] : vMax[b];
            t[2 * b + 1] = minFirst ? tMax[b] : tMin[b];
            v[2 * b + 1] = minFirst ? vMax[b] : vMin[b];
        }
        return new double[][] {t, v};
    }

    private void grow() {
        if (blocks == tMin.length) {
            int size = 2 * blocks;
            tMin = Arrays.copyOf(tMin, size);
            vMin = Arrays.copyOf(vMin, size);
            tMax = Arrays.copyOf(tMax, size);
            vMax = Arrays.copyOf(vMax, size);
        }
    }

    private void halve() {
        int kept = 0;
        for (int b = 0; b < blocks; b += 2) {
            int c = Math.min(b + 1, blocks - 1);
            boolean lowFromFirst = vMin[b] <= vMin[c];
            boolean highFromFirst = vMax[b] >= vMax[c];
            double nvMin = lowFromFirst ? vMin[b] : vMin[c];
            double ntMin = lowFromFirst ? tMin[b] : tMin[c];
            double nvMax = highFromFirst ? vMax[b] : vMax[c];
            double ntMax = highFromFirst ? tMax[b] : tMax[c];
            vMin[kept] = nvMin;
            tMin[kept] = ntMin;
            vMax[kept] = nvMax;
            tMax[kept] = ntMax;
            kept++;
        }
        blocks = kept;
        blockSize *= 2;
    }
}
