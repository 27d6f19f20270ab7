package dev.sheaf.miner.mine;

import dev.sheaf.vocab.io.SpillFile;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.ByteBuffer;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

/**
 * One worker's analysed listings as a compact symbol stream, so the later counting passes re-read
 * term ids instead of re-analysing text. Per listing: for each segment its token ids, then a
 * boundary; then an end mark. Symbols are varints (end = 0, boundary = 1, token = id + 2), about
 * 1.5 bytes per token. Listings never straddle blocks; when resident blocks exceed the budget, full
 * blocks go to a temporary file and are read back block by block.
 */
final class TokenStore implements AutoCloseable {
    static final int BOUNDARY = -1;
    private static final int BLOCK = 1 << 20;

    private final long residentBudget;
    private final Path spillFile;
    private SpillFile spill;

    private final List<byte[]> blocks = new ArrayList<>();
    private final List<Integer> used = new ArrayList<>();
    private final List<Long> fileOffsets = new ArrayList<>();
    private long resident;

    private byte[] current = new byte[BLOCK];
    private int pos;

    private byte[] scratch = new byte[4096];
    private int scratchLen;
    private long listings;
    private long symbols;

    TokenStore(long residentBudget, Path spillFile) {
        this.residentBudget = residentBudget;
        this.spillFile = spillFile;
    }

    void token(int id) {
        put(id + 2);
    }

    void boundary() {
        put(1);
    }

    /** Ends the listing being written and moves it into the block stream. */
    void endListing() {
        put(0);
        if (pos + scratchLen > current.length) {
            finishBlock();
            if (scratchLen > current.length) {
                current = new byte[scratchLen];
            }
        }
        System.arraycopy(scratch, 0, current, pos, scratchLen);
        pos += scratchLen;
        scratchLen = 0;
        listings++;
    }

    long listings() {
        return listings;
    }

    long symbols() {
        return symbols;
    }

    /** Bytes held in memory (for the summary and tests). */
    long residentBytes() {
        return resident + current.length;
    }

    boolean spilled() {
        return spill != null && spill.size() > 0;
    }

    private void put(int v) {
        if (scratchLen + 5 > scratch.length) {
            scratch = Arrays.copyOf(scratch, scratch.length * 2);
        }
        while ((v & ~0x7F) != 0) {
            scratch[scratchLen++] = (byte) ((v & 0x7F) | 0x80);
            v >>>= 7;
        }
        scratch[scratchLen++] = (byte) v;
        symbols++;
    }

    private void finishBlock() {
        if (pos == 0) {
            return;
        }
        blocks.add(current);
        used.add(pos);
        fileOffsets.add(-1L);
        resident += current.length;
        current = new byte[BLOCK];
        pos = 0;
        while (resident > residentBudget && spillOne()) {
            // keep going until under budget
        }
    }

    private boolean spillOne() {
        for (int i = 0; i < blocks.size(); i++) {
            byte[] b = blocks.get(i);
            if (b != null) {
                try {
                    if (spill == null) {
                        spill = SpillFile.create(spillFile);
                    }
                    fileOffsets.set(i, spill.append(b, 0, used.get(i)));
                    blocks.set(i, null);
                    resident -= b.length;
                    return true;
                } catch (IOException e) {
                    throw new UncheckedIOException("cannot write the token spill file " + spillFile
                            + " (" + e.getMessage() + "); free disk space or give a temp folder with room", e);
                }
            }
        }
        return false;
    }

    /** Called once writing is over: the partial block joins the stream. */
    void seal() {
        finishBlock();
    }

    /** Receives one listing's symbols: token ids, {@link #BOUNDARY} after each segment. */
    interface Visitor {
        void listing(int index, int[] symbols, int length);
    }

    /** Replays every listing in write order. */
    void forEach(Visitor v) {
        int[] out = new int[1024];
        byte[] readBuf = null;
        int index = 0;
        for (int bi = 0; bi < blocks.size(); bi++) {
            byte[] b = blocks.get(bi);
            int len = used.get(bi);
            if (b == null) {
                if (readBuf == null || readBuf.length < len) {
                    readBuf = new byte[Math.max(len, BLOCK)];
                }
                try {
                    spill.read(fileOffsets.get(bi), ByteBuffer.wrap(readBuf, 0, len));
                } catch (IOException e) {
                    throw new UncheckedIOException("cannot read the token spill file " + spillFile, e);
                }
                b = readBuf;
            }
            int p = 0;
            int n = 0;
            while (p < len) {
                int sym = 0;
                int shift = 0;
                byte x;
                do {
                    x = b[p++];
                    sym |= (x & 0x7F) << shift;
                    shift += 7;
                } while (x < 0);
                if (sym == 0) {
                    v.listing(index++, out, n);
                    n = 0;
                } else {
                    if (n == out.length) {
                        out = Arrays.copyOf(out, n * 2);
                    }
                    out[n++] = sym == 1 ? BOUNDARY : sym - 2;
                }
            }
        }
    }

    @Override
    public void close() {
        blocks.clear();
        if (spill != null) {
            try {
                spill.close();
            } catch (IOException e) {
                // a leftover temp file is harmless; the temp folder is removed as a whole later
            }
        }
    }
}
