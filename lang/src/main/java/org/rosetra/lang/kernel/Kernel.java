package org.rosetra.lang.kernel;

import java.io.PrintStream;
import java.util.List;
import java.util.UUID;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.TimeUnit;
import java.util.function.Supplier;
import org.zeromq.SocketType;
import org.zeromq.ZContext;
import org.zeromq.ZMQ;

/**
 * A notebook kernel speaking the Jupyter messaging protocol 5.3 over ZeroMQ.
 *
 * <p>Three threads, each owning its sockets: the shell thread answers shell requests and
 * runs the cells ({@link ShellLoop}); the heartbeat echoes ({@link Heartbeat}); the thread
 * that calls {@link #run()} answers control requests, so an interrupt or a shutdown gets
 * through while a long cell runs. IOPub is shared through {@link Publisher}.
 */
public final class Kernel {
    private static final int LINGER_MILLIS = 1000;
    private static final long SHELL_STOP_MILLIS = 3000;

    private final ConnectionInfo connection;
    private final CellEngine engine;
    private final PrintStream log;
    private final WireFormat wire;
    private final String stopAddress = "inproc://rosetra-kernel-stop-" + UUID.randomUUID();
    private final String wakeShellAddress = "inproc://rosetra-kernel-wake-" + UUID.randomUUID();
    private final CountDownLatch ready = new CountDownLatch(1);
    private final Object lifecycle = new Object();

    private ZContext context;
    private boolean closed;
    private boolean warmUp = true;
    private Supplier<? extends CellEngine> warmUpEngines;

    public Kernel(ConnectionInfo connection, CellEngine engine, PrintStream log) {
        this.connection = connection;
        this.engine = engine;
        this.log = log;
        this.wire = new WireFormat(new MessageSigner(connection.keyBytes()),
                UUID.randomUUID().toString());
    }

    /** Skips the warm-up before serving (tests, where start-up time matters more than speed). */
    public Kernel withoutWarmUp() {
        warmUp = false;
        return this;
    }

    /**
     * Warms up through a throwaway engine from {@code engines} (a fresh session, never the one
     * served), so the language code is compiled too, not only the message path.
     */
    public Kernel warmingUpWith(Supplier<? extends CellEngine> engines) {
        warmUpEngines = engines;
        return this;
    }

    /** Serves front ends until a shutdown request (or {@link #stop()}); returns when closed. */
    public void run() throws InterruptedException {
        ZContext zmq = new ZContext();
        zmq.setLinger(LINGER_MILLIS); // let the last replies leave before the sockets close
        synchronized (lifecycle) {
            context = zmq;
        }
        try {
            serve(zmq);
        } finally {
            synchronized (lifecycle) {
                closed = true;
                zmq.close();
            }
        }
    }

    /** Blocks until the sockets are bound, so a test can connect. */
    public boolean awaitReady(long timeout, TimeUnit unit) throws InterruptedException {
        return ready.await(timeout, unit);
    }

    /** Asks a running kernel, from any thread, to shut down as if a front end had asked. */
    public void stop() {
        synchronized (lifecycle) {
            if (context != null && !closed) {
                signal(context, stopAddress);
            }
        }
    }

    private void serve(ZContext zmq) throws InterruptedException {
        ZMQ.Socket shell = bound(zmq, SocketType.ROUTER, connection.shellPort());
        ZMQ.Socket control = bound(zmq, SocketType.ROUTER, connection.controlPort());
        ZMQ.Socket stdin = bound(zmq, SocketType.ROUTER, connection.stdinPort());
        Publisher iopub = new Publisher(bound(zmq, SocketType.PUB, connection.iopubPort()));
        ZMQ.Socket stopSignals = zmq.createSocket(SocketType.PULL);
        stopSignals.bind(stopAddress);
        ZMQ.Socket wakeShell = zmq.createSocket(SocketType.PULL);
        wakeShell.bind(wakeShellAddress);
        Heartbeat heartbeat = new Heartbeat(bound(zmq, SocketType.REP, connection.heartbeatPort()));

        String languageVersion = engine.languageVersion();
        String implementationVersion = KernelInfo.implementationVersion();
        ShellRequests shellRequests = new ShellRequests(engine, implementationVersion,
                languageVersion, log);
        StayAwake awake = new StayAwake();
        ShellLoop shellLoop = new ShellLoop(shell, wakeShell, zmq.createPoller(2), wire,
                shellRequests, iopub, log, () -> signal(zmq, stopAddress), awake);
        Thread shellThread = new Thread(shellLoop, "rosetra-shell");
        shellThread.setDaemon(true); // a cell that ignores an interrupt must not keep the JVM alive
        heartbeat.start(); // first, so a front end waiting for us sees a live kernel
        if (warmUp) {
            long started = System.nanoTime();
            int cells = warmUpEngines == null ? WarmUp.run() : WarmUp.run(warmUpEngines.get());
            log.println("rosetra kernel: warmed up with " + cells + " cells in "
                    + (System.nanoTime() - started) / 1_000_000 + " ms");
        }
        awake.start();
        shellThread.start();

        MessageOut controlOut = new SocketOut(wire, control, iopub);
        ZMQ.Poller poller = zmq.createPoller(3);
        int controlIndex = poller.register(control, ZMQ.Poller.POLLIN);
        int stopIndex = poller.register(stopSignals, ZMQ.Poller.POLLIN);
        int stdinIndex = poller.register(stdin, ZMQ.Poller.POLLIN);
        ready.countDown();
        log.println("rosetra kernel: listening on " + connection);

        boolean running = true;
        while (running && poller.poll(-1) >= 0) {
            if (poller.pollin(controlIndex)) {
                running = onControl(Frames.receive(control, 0), controlOut, shellRequests,
                        languageVersion, implementationVersion);
                controlOut.flush();
            }
            if (poller.pollin(stopIndex)) {
                running = false;
            }
            if (poller.pollin(stdinIndex)) {
                Frames.receive(stdin, 0); // the kernel never asks for input, so nothing is awaited
            }
        }

        if (shellRequests.isCellRunning()) {
            engine.interrupt();
        }
        signal(zmq, wakeShellAddress);
        shellThread.join(SHELL_STOP_MILLIS);
        if (shellThread.isAlive()) {
            log.println("rosetra kernel: a cell did not stop; leaving it behind");
        }
        heartbeat.stop();
        iopub.stop();
        awake.stop();
        poller.close();
        log.println("rosetra kernel: shut down");
    }

    private ZMQ.Socket bound(ZContext zmq, SocketType type, int port) {
        ZMQ.Socket socket = zmq.createSocket(type);
        socket.bind(connection.endpoint(port));
        return socket;
    }

    private static void signal(ZContext zmq, String address) {
        ZMQ.Socket push = zmq.createSocket(SocketType.PUSH);
        push.connect(address);
        push.send(new byte[] {1}, 0);
        push.setLinger(LINGER_MILLIS);
        push.close();
    }

    /** Handles one control request; false when the kernel should stop. */
    private boolean onControl(List<byte[]> frames, MessageOut out, ShellRequests shellRequests,
            String languageVersion, String implementationVersion) {
        try {
            return answerControl(frames, out, shellRequests, languageVersion, implementationVersion);
        } catch (RuntimeException e) {
            log.println("rosetra kernel: failed to answer a control request");
            e.printStackTrace(log);
            return true;
        }
    }

    private boolean answerControl(List<byte[]> frames, MessageOut out, ShellRequests shellRequests,
            String languageVersion, String implementationVersion) {
        Request request = decodeOrLog(wire, frames, "control", log);
        if (request == null) {
            return true;
        }
        boolean keepRunning = true;
        out.status(request, "busy");
        switch (request.type()) {
            case "interrupt_request" -> {
                if (shellRequests.isCellRunning()) {
                    engine.interrupt();
                }
                out.reply(request, "interrupt_reply", json -> json.writeStringField("status", "ok"));
            }
            case "shutdown_request" -> {
                boolean restart = request.content().flag("restart", false);
                out.reply(request, "shutdown_reply", json -> {
                    json.writeStringField("status", "ok");
                    json.writeBooleanField("restart", restart);
                });
                keepRunning = false;
            }
            case "kernel_info_request" -> out.reply(request, "kernel_info_reply",
                    KernelInfo.content(implementationVersion, languageVersion));
            default -> log.println("rosetra kernel: ignoring " + request.type() + " on control");
        }
        out.status(request, "idle");
        return keepRunning;
    }

    /** The request in {@code frames}, or null (and a line in the log) when it must be dropped. */
    static Request decodeOrLog(WireFormat wire, List<byte[]> frames, String channel, PrintStream log) {
        try {
            return wire.decode(frames);
        } catch (RejectedMessage e) {
            log.println("rosetra kernel: dropped a message on " + channel + ": " + e.getMessage());
            return null;
        }
    }
}
