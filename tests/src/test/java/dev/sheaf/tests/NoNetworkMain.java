package dev.sheaf.tests;

import dev.sheaf.miner.cli.Main;
import java.io.IOException;
import java.io.OutputStreamWriter;
import java.io.PrintWriter;
import java.io.UncheckedIOException;
import java.lang.management.ManagementFactory;
import java.lang.management.MemoryPoolMXBean;
import java.lang.management.MemoryType;
import java.net.DatagramSocket;
import java.net.ServerSocket;
import java.net.Socket;
import java.net.SocketException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardOpenOption;

/**
 * Runs the {@code sheaf} command line in a process that cannot open a socket, and says so if
 * anything tries: every {@link Socket}, {@link ServerSocket} and {@link DatagramSocket} is made by
 * a factory that records the attempt and fails, and NIO channels come from
 * {@link NoNetworkSelectorProvider} (set with {@code -Djava.nio.channels.spi.SelectorProvider}),
 * which does the same. The {@code java.net} factories catch URL connections, HTTP clients built on
 * sockets and XML parsers fetching a DTD; the provider catches {@code SocketChannel} and the JDK's
 * HTTP client. No agent, no security manager (deprecated in Java 17).
 *
 * <p>Attempts are appended to the file named by {@code -Dsheaf.netlog}; on exit the peak heap
 * (sum of the heap pools' peaks) is printed on stderr as {@code sheaf-peak-heap-bytes N}.
 */
public final class NoNetworkMain {
    private NoNetworkMain() {
    }

    static void attempt(String what) {
        String log = System.getProperty("sheaf.netlog");
        String line = "socket attempt: " + what + " from " + Thread.currentThread().getName() + "\n";
        System.err.print("sheaf-net: " + line);
        if (log != null) {
            try {
                Files.writeString(Path.of(log), line, StandardCharsets.UTF_8, StandardOpenOption.CREATE, StandardOpenOption.APPEND);
            } catch (IOException e) {
                throw new UncheckedIOException(e);
            }
        }
    }

    @SuppressWarnings("deprecation") // DatagramSocket's factory setter is deprecated in 17 but still the only hook
    public static void main(String[] args) throws IOException {
        Socket.setSocketImplFactory(() -> {
            attempt("java.net.Socket");
            throw new IllegalStateException("no network: this process may not open sockets");
        });
        ServerSocket.setSocketFactory(() -> {
            attempt("java.net.ServerSocket");
            throw new IllegalStateException("no network: this process may not open sockets");
        });
        try {
            DatagramSocket.setDatagramSocketImplFactory(() -> {
                attempt("java.net.DatagramSocket");
                throw new IllegalStateException("no network: this process may not open sockets");
            });
        } catch (SocketException e) {
            throw new IllegalStateException(e);
        }
        PrintWriter out = new PrintWriter(new OutputStreamWriter(System.out, StandardCharsets.UTF_8), true);
        PrintWriter err = new PrintWriter(new OutputStreamWriter(System.err, StandardCharsets.UTF_8), true);
        int code = Main.commandLine(out, err).execute(args);
        out.flush();
        long peak = 0;
        for (MemoryPoolMXBean p : ManagementFactory.getMemoryPoolMXBeans()) {
            if (p.getType() == MemoryType.HEAP && p.getPeakUsage() != null) {
                peak += p.getPeakUsage().getUsed();
            }
        }
        err.println("sheaf-peak-heap-bytes " + peak);
        err.flush();
        System.exit(code);
    }
}
