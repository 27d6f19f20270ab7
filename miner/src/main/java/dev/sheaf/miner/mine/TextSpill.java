package dev.sheaf.miner.mine;

import dev.sheaf.miner.ingest.Field;
import dev.sheaf.miner.ingest.FieldKind;
import dev.sheaf.miner.ingest.Listing;
import dev.sheaf.vocab.io.SpillFile;
import it.unimi.dsi.fastutil.longs.LongArrayList;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.ByteBuffer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

/**
 * One worker's listings written to a temporary file as they stream past, so evidence lines can be
 * cut for the final candidates without keeping every text in memory or reading the sources twice.
 * Only the few listings that supply evidence are ever read back.
 */
final class TextSpill implements AutoCloseable {
    private static final FieldKind[] KINDS = FieldKind.values();

    private final SpillFile spill;
    private final LongArrayList offsets = new LongArrayList();
    private byte[] record = new byte[4096];
    private int recordLen;

    TextSpill(Path file) {
        try {
            this.spill = SpillFile.create(file);
        } catch (IOException e) {
            throw new UncheckedIOException("cannot create the temporary text file " + file + " (" + e.getMessage()
                    + "); give a writable temp folder", e);
        }
    }

    /**
     * Appends a listing with the token offsets of its first analysis ({@code offsets}: per segment
     * field, part ordinal, token count, then start and end of each token), so evidence never needs
     * a second analysis.
     */
    void write(Listing l, int sourceId, int[] offsets, int offsetsLength) {
        recordLen = 0;
        putString(l.id());
        putString(l.category());
        putInt(sourceId);
        putString(l.locator());
        List<Field> fields = l.fields();
        putInt(fields.size());
        for (Field f : fields) {
            ensure(1);
            record[recordLen++] = (byte) f.kind().ordinal();
            putString(f.key());
            putString(f.text());
        }
        putInt(offsetsLength);
        int prevEnd = 0;
        for (int i = 0; i < offsetsLength; ) {
            int field = offsets[i++];
            int part = offsets[i++];
            int n = offsets[i++];
            putVar(field);
            putVar(part);
            putVar(n);
            prevEnd = 0;
            for (int t = 0; t < n; t++) {
                int start = offsets[i++];
                int end = offsets[i++];
                putVar(start - prevEnd);
                putVar(end - start);
                prevEnd = end;
            }
        }
        try {
            this.offsets.add(spill.append(record, 0, recordLen));
        } catch (IOException e) {
            throw new UncheckedIOException("cannot write the temporary text file " + spill.path() + " (" + e.getMessage()
                    + "); free disk space or give another temp folder", e);
        }
    }

    /** A listing read back with the offsets of its first analysis, by symbol position (as in the token store). */
    record Stored(Listing listing, int[] field, int[] part, int[] start, int[] end, int positions) {
    }

    /** Reads back listing {@code index}; {@code sources} maps source ids to names. */
    Stored read(int index, String[] sources) {
        long from = offsets.getLong(index);
        long to = index + 1 < offsets.size() ? offsets.getLong(index + 1) : spill.size();
        ByteBuffer b = ByteBuffer.allocate((int) (to - from));
        try {
            spill.read(from, b);
        } catch (IOException e) {
            throw new UncheckedIOException("cannot read the temporary text file " + spill.path(), e);
        }
        b.flip();
        String id = getString(b);
        String category = getString(b);
        int sourceId = b.getInt();
        String locator = getString(b);
        int n = b.getInt();
        List<Field> fields = new ArrayList<>(n);
        for (int i = 0; i < n; i++) {
            FieldKind kind = KINDS[b.get()];
            String key = getString(b);
            String text = getString(b);
            fields.add(new Field(kind, key, text));
        }
        int offsetInts = b.getInt();
        int cap = offsetInts;
        int[] pf = new int[cap];
        int[] pp = new int[cap];
        int[] ps = new int[cap];
        int[] pe = new int[cap];
        int pos = 0;
        int read = 0;
        while (read < offsetInts) {
            int field = getVar(b);
            int part = getVar(b);
            int count = getVar(b);
            read += 3 + 2 * count;
            int prevEnd = 0;
            for (int t = 0; t < count; t++) {
                int start = prevEnd + getVar(b);
                int end = start + getVar(b);
                pf[pos] = field;
                pp[pos] = part;
                ps[pos] = start;
                pe[pos] = end;
                prevEnd = end;
                pos++;
            }
            pf[pos] = -1;
            pp[pos] = -1;
            pos++;
        }
        return new Stored(new Listing(id, category, sources[sourceId], locator, fields), pf, pp, ps, pe, pos);
    }

    private void putVar(int v) {
        ensure(5);
        while ((v & ~0x7F) != 0) {
            record[recordLen++] = (byte) ((v & 0x7F) | 0x80);
            v >>>= 7;
        }
        record[recordLen++] = (byte) v;
    }

    private static int getVar(ByteBuffer b) {
        int v = 0;
        int shift = 0;
        byte x;
        do {
            x = b.get();
            v |= (x & 0x7F) << shift;
            shift += 7;
        } while (x < 0);
        return v;
    }

    private void putString(String s) {
        byte[] bytes = s.getBytes(StandardCharsets.UTF_8);
        putInt(bytes.length);
        ensure(bytes.length);
        System.arraycopy(bytes, 0, record, recordLen, bytes.length);
        recordLen += bytes.length;
    }

    private void putInt(int v) {
        ensure(4);
        record[recordLen++] = (byte) (v >>> 24);
        record[recordLen++] = (byte) (v >>> 16);
        record[recordLen++] = (byte) (v >>> 8);
        record[recordLen++] = (byte) v;
    }

    private void ensure(int n) {
        if (recordLen + n > record.length) {
            record = java.util.Arrays.copyOf(record, Math.max(record.length * 2, recordLen + n));
        }
    }

    private static String getString(ByteBuffer b) {
        int len = b.getInt();
        String s = new String(b.array(), b.arrayOffset() + b.position(), len, StandardCharsets.UTF_8);
        b.position(b.position() + len);
        return s;
    }

    @Override
    public void close() {
        try {
            spill.close();
        } catch (IOException ignored) {
            // the temp folder is removed as a whole afterwards
        }
    }
}
