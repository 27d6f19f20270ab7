package dev.sheaf.vocab.io;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.ByteBuffer;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Map;
import java.util.Random;
import java.util.concurrent.ConcurrentHashMap;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class SpillFileTest {
    @TempDir
    Path dir;

    /** Record {@code i}: its bytes are a function of i, so any mix-up of offsets shows. */
    private static byte[] record(int i, int len) {
        byte[] b = new byte[len];
        Random r = new Random(i);
        r.nextBytes(b);
        return b;
    }

    @Test
    void recordsOfEverySizeReadBackExactlyInAnyOrder() throws IOException {
        Random sizes = new Random(7);
        int n = 400;
        int[] len = new int[n];
        long[] at = new long[n];
        try (SpillFile f = SpillFile.create(dir.resolve("x.spill"))) {
            long expectedEnd = 0;
            for (int i = 0; i < n; i++) {
                // mostly small, a few past the write buffer (1 MB) and past half the read window (2 MB)
                len[i] = i % 97 == 0 ? 3_000_000 : i % 41 == 0 ? 1_500_000 : sizes.nextInt(20_000);
                at[i] = f.append(record(i, len[i]), 0, len[i]);
                assertEquals(expectedEnd, at[i], "offsets are the logical end, flushed or not");
                expectedEnd += len[i];
                assertEquals(expectedEnd, f.size());
            }
            List<Integer> order = new ArrayList<>();
            for (int i = 0; i < n; i++) {
                order.add(i);
            }
            for (int pass = 0; pass < 2; pass++) {
                if (pass == 1) {
                    Collections.shuffle(order, new Random(3));
                }
                for (int i : order) {
                    ByteArrayOutputStream out = new ByteArrayOutputStream();
                    f.copyTo(at[i], len[i], out);
                    assertArrayEquals(record(i, len[i]), out.toByteArray(), "copyTo of record " + i);
                    ByteBuffer b = ByteBuffer.allocate(len[i]);
                    f.read(at[i], b);
                    assertArrayEquals(record(i, len[i]), b.array(), "read of record " + i);
                }
            }
        }
    }

    @Test
    void aReadSeesAppendsStillInTheBufferAndAppendsAfterAReadLandAtTheEnd() throws IOException {
        try (SpillFile f = SpillFile.create(dir.resolve("y.spill"))) {
            long a = f.append(new byte[] {1, 2, 3}, 0, 3);
            ByteArrayOutputStream out = new ByteArrayOutputStream();
            f.copyTo(a, 3, out);
            assertArrayEquals(new byte[] {1, 2, 3}, out.toByteArray());
            long b = f.append(new byte[] {9, 4, 5, 6}, 1, 3);
            assertEquals(3, b);
            out.reset();
            f.copyTo(a, 6, out); // the window filled before the second append must not serve stale bytes
            assertArrayEquals(new byte[] {1, 2, 3, 4, 5, 6}, out.toByteArray());
        }
    }

    @Test
    void readingPastTheEndIsAnErrorNamingTheFile() throws IOException {
        Path p = dir.resolve("z.spill");
        try (SpillFile f = SpillFile.create(p)) {
            f.append(new byte[10], 0, 10);
            IOException e = assertThrows(IOException.class, () -> f.copyTo(5, 10, new ByteArrayOutputStream()));
            assertTrue(e.getMessage().contains(p.toString()), e.getMessage());
            assertThrows(IOException.class, () -> f.read(8, ByteBuffer.allocate(5)));
        }
    }

    @Test
    void severalThreadsAppendAndReadWithoutLosingOrTearingARecord() throws Exception {
        Map<Integer, Long> offsets = new ConcurrentHashMap<>();
        try (SpillFile f = SpillFile.create(dir.resolve("t.spill"))) {
            List<Thread> threads = new ArrayList<>();
            for (int t = 0; t < 4; t++) {
                int base = t * 10_000;
                Thread th = new Thread(() -> {
                    for (int i = base; i < base + 2_000; i++) {
                        try {
                            offsets.put(i, f.append(record(i, 1 + i % 700), 0, 1 + i % 700));
                        } catch (IOException e) {
                            throw new UncheckedIOException(e);
                        }
                    }
                });
                threads.add(th);
                th.start();
            }
            for (Thread th : threads) {
                th.join();
            }
            assertEquals(8_000, offsets.size());
            long total = 0;
            for (Map.Entry<Integer, Long> e : offsets.entrySet()) {
                int i = e.getKey();
                ByteArrayOutputStream out = new ByteArrayOutputStream();
                f.copyTo(e.getValue(), 1 + i % 700, out);
                assertArrayEquals(record(i, 1 + i % 700), out.toByteArray(), "record " + i);
                total += 1 + i % 700;
            }
            assertEquals(total, f.size());
            List<Thread> readers = new ArrayList<>();
            Map<Integer, Boolean> same = new ConcurrentHashMap<>();
            for (int t = 0; t < 4; t++) {
                int base = t * 10_000;
                Thread th = new Thread(() -> {
                    for (int i = base; i < base + 2_000; i++) {
                        ByteBuffer b = ByteBuffer.allocate(1 + i % 700);
                        try {
                            f.read(offsets.get(i), b);
                        } catch (IOException e) {
                            throw new UncheckedIOException(e);
                        }
                        same.put(i, java.util.Arrays.equals(record(i, 1 + i % 700), b.array()));
                    }
                });
                readers.add(th);
                th.start();
            }
            for (Thread th : readers) {
                th.join();
            }
            assertEquals(8_000, same.size(), "every reader finished");
            assertFalse(same.containsValue(false), "a record read by several threads at once came back torn");
        }
    }

    @Test
    void closingDeletesTheFile() throws IOException {
        Path p = dir.resolve("d.spill");
        SpillFile f = SpillFile.create(p);
        f.append(new byte[5], 0, 5);
        f.close();
        assertFalse(Files.exists(p));
    }
}
