package dev.sheaf.miner.mine;

import java.io.BufferedInputStream;
import java.io.DataInputStream;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.PriorityQueue;

/**
 * Adds up the workers' counts of one pass and keeps the codes that reach both minimums. With no
 * run files the tables are merged by probing (each code looked up in the other tables once); when
 * any worker spilled, every table becomes a sorted run and the runs are merged in code order, so
 * the full union never has to fit in memory.
 */
final class CountMerger {
    private CountMerger() {
    }

    /** Result: the frequent table and how many distinct codes were counted in all. */
    record Merged(FrequentTable table, long distinct) {
    }

    static Merged merge(List<NgramCounter> counters, int minFrequency, int minDf) {
        boolean runs = counters.stream().anyMatch(NgramCounter::hasRuns);
        return runs ? mergeRuns(counters, minFrequency, minDf) : mergeTables(counters, minFrequency, minDf);
    }

    private static Merged mergeTables(List<NgramCounter> counters, int minFrequency, int minDf) {
        int expected = 0;
        for (NgramCounter c : counters) {
            expected = Math.max(expected, c.size / 4);
        }
        FrequentTable out = new FrequentTable(expected);
        long distinct = 0;
        for (int w = 0; w < counters.size(); w++) {
            NgramCounter a = counters.get(w);
            for (int s = 0; s < a.capacity(); s++) {
                if (!a.occupied(s) || a.consumed(s)) {
                    continue;
                }
                long code = a.keys[s];
                long tf = a.tf[s];
                long df = a.df[s];
                for (int v = w + 1; v < counters.size(); v++) {
                    NgramCounter b = counters.get(v);
                    int t = b.find(code);
                    if (t >= 0) {
                        tf += b.tf[t];
                        df += b.df[t];
                        b.consume(t);
                    }
                }
                distinct++;
                if (tf >= minFrequency && df >= minDf) {
                    out.add(code, checked(tf, code), checked(df, code));
                }
            }
        }
        return new Merged(out, distinct);
    }

    private static Merged mergeRuns(List<NgramCounter> counters, int minFrequency, int minDf) {
        List<Path> files = new ArrayList<>();
        for (NgramCounter c : counters) {
            c.spill();
            files.addAll(c.runs());
        }
        FrequentTable out = new FrequentTable(1 << 16);
        long distinct = 0;
        List<RunReader> readers = new ArrayList<>();
        try {
            PriorityQueue<RunReader> heap = new PriorityQueue<>((x, y) -> Long.compare(x.code, y.code));
            for (Path f : files) {
                RunReader r = new RunReader(f);
                readers.add(r);
                if (r.next()) {
                    heap.add(r);
                }
            }
            while (!heap.isEmpty()) {
                RunReader r = heap.poll();
                long code = r.code;
                long tf = r.tf;
                long df = r.df;
                if (r.next()) {
                    heap.add(r);
                }
                while (!heap.isEmpty() && heap.peek().code == code) {
                    RunReader q = heap.poll();
                    tf += q.tf;
                    df += q.df;
                    if (q.next()) {
                        heap.add(q);
                    }
                }
                distinct++;
                if (tf >= minFrequency && df >= minDf) {
                    out.add(code, checked(tf, code), checked(df, code));
                }
            }
        } catch (IOException e) {
            throw new UncheckedIOException("cannot read back a count run (" + e.getMessage() + ")", e);
        } finally {
            for (RunReader r : readers) {
                r.close();
            }
            for (Path f : files) {
                try {
                    Files.deleteIfExists(f);
                } catch (IOException ignored) {
                    // the temp folder is removed as a whole afterwards
                }
            }
        }
        return new Merged(out, distinct);
    }

    private static int checked(long v, long code) {
        if (v > Integer.MAX_VALUE) {
            throw new ArithmeticException("an n-gram occurs more than 2^31-1 times (code " + code
                    + "); this corpus is beyond one machine's counters — split it");
        }
        return (int) v;
    }

    private static final class RunReader implements AutoCloseable {
        private final DataInputStream in;
        private int left;
        long code;
        int tf;
        int df;

        RunReader(Path f) throws IOException {
            in = new DataInputStream(new BufferedInputStream(Files.newInputStream(f), 1 << 16));
            left = in.readInt();
        }

        boolean next() throws IOException {
            if (left == 0) {
                return false;
            }
            left--;
            code = in.readLong();
            long c = in.readLong();
            tf = (int) (c >>> 32);
            df = (int) c;
            return true;
        }

        @Override
        public void close() {
            try {
                in.close();
            } catch (IOException ignored) {
                // read-only temp file
            }
        }
    }
}
