package org.congener.broker;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.net.InetAddress;
import java.net.InetSocketAddress;
import java.net.ServerSocket;

/** Port checks on the loopback address, done before a server binds so that a taken port gives a clear message. */
public final class FreePorts {

    static final String LOOPBACK = "127.0.0.1";

    private FreePorts() {
    }

    /** A port that was free on 127.0.0.1 a moment ago, chosen by the operating system. */
    public static int pick() {
        try (ServerSocket socket = new ServerSocket(0, 1, InetAddress.getByName(LOOPBACK))) {
            return socket.getLocalPort();
        } catch (IOException e) {
            throw new UncheckedIOException("cannot find a free port on " + LOOPBACK, e);
        }
    }

    /** Whether something is already listening on (or holds) {@code port} on 127.0.0.1. */
    public static boolean isTaken(int port) {
        try (ServerSocket socket = new ServerSocket()) {
            socket.setReuseAddress(true);
            socket.bind(new InetSocketAddress(InetAddress.getByName(LOOPBACK), port), 1);
            return false;
        } catch (IOException e) {
            return true;
        }
    }

    /** {@code port} itself when it is positive, a freshly picked free port when it is 0. */
    public static int resolve(int port) {
        if (port < 0 || port > 65535) {
            throw new IllegalArgumentException("port must be 0 (pick a free one) or 1-65535, got " + port);
        }
        return port == 0 ? pick() : port;
    }
}
