package org.protolyte.service;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.InputStream;
import java.net.Socket;
import java.nio.charset.StandardCharsets;

/** HTTP/1.1 by hand, for what a well-behaved client never does: lie about lengths, stall halfway. */
final class RawHttp implements AutoCloseable {

    private final Socket socket;

    RawHttp(int port, int readTimeoutMillis) throws IOException {
        socket = new Socket("127.0.0.1", port);
        socket.setSoTimeout(readTimeoutMillis);
    }

    void send(String text) throws IOException {
        send(text.getBytes(StandardCharsets.ISO_8859_1));
    }

    void send(byte[] bytes) throws IOException {
        socket.getOutputStream().write(bytes);
        socket.getOutputStream().flush();
    }

    /** Everything the server sends until it closes or the read timeout passes (then what came so far). */
    String readAll() throws IOException {
        ByteArrayOutputStream got = new ByteArrayOutputStream();
        InputStream in = socket.getInputStream();
        byte[] b = new byte[8192];
        try {
            for (int n; (n = in.read(b)) >= 0; ) {
                got.write(b, 0, n);
            }
        } catch (java.net.SocketTimeoutException e) {
            got.write(("\n[read timed out: " + e.getMessage() + "]").getBytes(StandardCharsets.ISO_8859_1));
        }
        return got.toString(StandardCharsets.ISO_8859_1);
    }

    /** The status code of the first response line, or -1 where none came. */
    static int status(String response) {
        return response.startsWith("HTTP/1.1 ") ? Integer.parseInt(response.substring(9, 12)) : -1;
    }

    @Override
    public void close() throws IOException {
        socket.close();
    }
}
