package dev.sheaf.tests;

import java.io.IOException;
import java.net.ProtocolFamily;
import java.nio.channels.DatagramChannel;
import java.nio.channels.Pipe;
import java.nio.channels.ServerSocketChannel;
import java.nio.channels.SocketChannel;
import java.nio.channels.spi.AbstractSelector;
import java.nio.channels.spi.SelectorProvider;

/**
 * The NIO half of {@link NoNetworkMain}: selectors and pipes (local, used by the JDK itself) come
 * from the platform's provider; every network channel is recorded and refused. Installed with
 * {@code -Djava.nio.channels.spi.SelectorProvider=dev.sheaf.tests.NoNetworkSelectorProvider}; the
 * platform provider is reached with {@code --add-exports java.base/sun.nio.ch=ALL-UNNAMED}.
 */
public final class NoNetworkSelectorProvider extends SelectorProvider {
    private final SelectorProvider platform = platform();

    private static SelectorProvider platform() {
        try {
            return (SelectorProvider) Class.forName("sun.nio.ch.DefaultSelectorProvider").getMethod("get").invoke(null);
        } catch (ReflectiveOperationException e) {
            throw new IllegalStateException("the platform selector provider is not reachable; add "
                    + "--add-exports java.base/sun.nio.ch=ALL-UNNAMED", e);
        }
    }

    private static IOException refuse(String what) {
        NoNetworkMain.attempt(what);
        return new IOException("no network: this process may not open " + what);
    }

    @Override
    public DatagramChannel openDatagramChannel() throws IOException {
        throw refuse("DatagramChannel");
    }

    @Override
    public DatagramChannel openDatagramChannel(ProtocolFamily family) throws IOException {
        throw refuse("DatagramChannel");
    }

    @Override
    public Pipe openPipe() throws IOException {
        return platform.openPipe();
    }

    @Override
    public AbstractSelector openSelector() throws IOException {
        return platform.openSelector();
    }

    @Override
    public ServerSocketChannel openServerSocketChannel() throws IOException {
        throw refuse("ServerSocketChannel");
    }

    @Override
    public SocketChannel openSocketChannel() throws IOException {
        throw refuse("SocketChannel");
    }
}
