package org.protolyte.service;

import java.nio.ByteBuffer;
import java.util.Arrays;
import java.util.concurrent.CompletableFuture;

import org.eclipse.jetty.io.Content;

/**
 * Reads a request body as it arrives, without a thread waiting on it, and stops at a limit: the body past it is never
 * read, and the answer is {@link TooLarge}. A failure of the connection (an idle timeout) is the answer's failure.
 */
final class BodyReader {

    /** The body passed its limit; nothing more of it was read. */
    static final class TooLarge extends Exception {
        private static final long serialVersionUID = 1L;

        TooLarge(long limit) {
            super("the body is larger than " + limit + " bytes");
        }
    }

    private final Content.Source source;
    private final int limit;
    private final CompletableFuture<byte[]> body = new CompletableFuture<>();
    private byte[] bytes = new byte[8192];
    private int size;

    private BodyReader(Content.Source source, int limit) {
        this.source = source;
        this.limit = limit;
    }

    static CompletableFuture<byte[]> read(Content.Source source, int limit) {
        BodyReader r = new BodyReader(source, limit);
        r.next();
        return r.body;
    }

    private void next() {
        while (true) {
            Content.Chunk chunk = source.read();
            if (chunk == null) {
                source.demand(this::next);
                return;
            }
            if (Content.Chunk.isFailure(chunk)) {
                body.completeExceptionally(chunk.getFailure());
                return;
            }
            try {
                ByteBuffer b = chunk.getByteBuffer();
                if ((long) size + b.remaining() > limit) {
                    body.completeExceptionally(new TooLarge(limit));
                    return;
                }
                if (size + b.remaining() > bytes.length) {
                    bytes = Arrays.copyOf(bytes, (int) Math.min(limit, Math.max(2L * bytes.length,
                            (long) size + b.remaining())));
                }
                int n = b.remaining();
                b.get(bytes, size, n);
                size += n;
            } finally {
                chunk.release();
            }
            if (chunk.isLast()) {
                body.complete(Arrays.copyOf(bytes, size));
                return;
            }
        }
    }
}
