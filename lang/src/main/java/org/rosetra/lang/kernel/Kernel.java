package org.rosetra.lang.kernel;

import java.io.PrintStream;
import java.util.ArrayList;
import java.util.List;
import java.util.UUID;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicLong;
import org.zeromq.SocketType;
import org.zeromq.ZContext;
import org.zeromq.ZMQ;

/**
 * A notebook kernel speaking the Jupyter messaging protocol 5.3 over ZeroMQ.
 *
 * <p>The calling thread owns every front-end socket and waits on one poller. Shell requests
 * run in arrival order on a single worker thread, whose messages come back to the calling
 * thread over an in-process socket (ZeroMQ sockets must stay on one thread). So control
 * requests (interrupt, shutdown) and the heartbeat are answered while a long cell runs.
 */
public final class Kernel {
    private static final byte ROUTE_IOPUB = 'P';
    private static final byte ROUTE_SHELL = 'S';
    private static final byte ROUTE_STOP = 'X';
    private static final int LINGER_MILLIS = 1000;

    private final ConnectionInfo connection;
    private final CellEngine engine;
    private final PrintStream log;
    private final WireFormat wire;
    private final String inboxAddress = "inproc://rosetra-kernel-" + UUID.randomUUID();
    private final AtomicLong lastArrival = new AtomicLong();
    private final CountDownLatch ready = new CountDownLatch(1);
    private final Object lifecycle = new Object();

    private ZContext context;
    private boolean closed;

    public Kernel(ConnectionInfo connection, CellEngine engine, PrintStream log) {
        this.connection = connection;
        this.engine = engine;
        this.log = log;
        this.wire = new WireFormat(new MessageSigner(connection.keyBytes()),
                UUID.randomUUID().toString());
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
            if (context == null || closed) {
                return;
            }
            ZMQ.Socket push = context.createSocket(SocketType.PUSH);
            push.connect(inboxAddress);
            push.send(new byte[] {ROUTE_STOP}, 0);
            context.destroySocket(push);
        }
    }

    private void serve(ZContext zmq) throws InterruptedException {
        ZMQ.Socket shell = bound(zmq, SocketType.ROUTER, connection.shellPort());
        ZMQ.Socket control = bound(zmq, SocketType.ROUTER, connection.controlPort());
        ZMQ.Socket stdin = bound(zmq, SocketType.ROUTER, connection.stdinPort());
        ZMQ.Socket iopub = bound(zmq, SocketType.PUB, connection.iopubPort());
        ZMQ.Socket inbox = zmq.createSocket(SocketType.PULL);
        inbox.bind(inboxAddress);
        Heartbeat heartbeat = new Heartbeat(bound(zmq, SocketType.REP, connection.heartbeatPort()));
        heartbeat.start();

        String languageVersion = engine.languageVersion();
        String implementationVersion = KernelInfo.implementationVersion();
        ExecutorService worker = Executors.newSingleThreadExecutor(runnable -> {
            Thread thread = new Thread(runnable, "rosetra-cell");
            thread.setDaemon(true); // a cell that ignores an interrupt must not keep the process alive
            return thread;
        });
        WorkerOut workerOut = new WorkerOut(zmq);
        ShellRequests shellRequests = new ShellRequests(engine, implementationVersion,
                languageVersion, lastArrival, log, workerOut::stopKernel);
        MessageOut controlOut = new DirectOut(control, iopub);

        ZMQ.Poller poller = zmq.createPoller(4);
        int controlIndex = poller.register(control, ZMQ.Poller.POLLIN);
        int inboxIndex = poller.register(inbox, ZMQ.Poller.POLLIN);
        int shellIndex = poller.register(shell, ZMQ.Poller.POLLIN);
        int stdinIndex = poller.register(stdin, ZMQ.Poller.POLLIN);
        ready.countDown();
        log.println("rosetra kernel: listening on " + connection);

        boolean running = true;
        while (running && !Thread.currentThread().isInterrupted()) {
            if (poller.poll(-1) < 0) {
                break;
            }
            if (poller.pollin(controlIndex)) {
                running = onControl(receive(control, 0), controlOut, shellRequests, languageVersion,
                        implementationVersion);
            }
            if (poller.pollin(inboxIndex)) {
                running &= forwardAll(inbox, shell, iopub);
            }
            if (poller.pollin(shellIndex)) {
                onShell(receive(shell, 0), worker, shellRequests, workerOut);
            }
            if (poller.pollin(stdinIndex)) {
                receive(stdin, 0); // we never ask for input, so replies have no one to go to
            }
        }

        if (shellRequests.isCellRunning()) {
            engine.interrupt();
        }
        worker.shutdownNow();
        worker.awaitTermination(2, TimeUnit.SECONDS);
        forwardAll(inbox, shell, iopub); // what the stopped cell said last
        heartbeat.stop();
        poller.close();
        log.println("rosetra kernel: shut down");
    }

    private ZMQ.Socket bound(ZContext zmq, SocketType type, int port) {
        ZMQ.Socket socket = zmq.createSocket(type);
        socket.bind(connection.endpoint(port));
        return socket;
    }

    private void onShell(List<byte[]> frames, ExecutorService worker, ShellRequests shellRequests,
            MessageOut out) {
        Request request = decodeOrLog(frames, "shell");
        if (request == null) {
            return;
        }
        Request numbered = request.numbered(lastArrival.incrementAndGet());
        worker.execute(() -> shellRequests.handle(numbered, out));
    }

    /** Handles one control request; false when the kernel should stop. */
    private boolean onControl(List<byte[]> frames, MessageOut out, ShellRequests shellRequests,
            String languageVersion, String implementationVersion) {
        Request request = decodeOrLog(frames, "control");
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

    private Request decodeOrLog(List<byte[]> frames, String channel) {
        try {
            return wire.decode(frames);
        } catch (RejectedMessage e) {
            log.println("rosetra kernel: dropped a message on " + channel + ": " + e.getMessage());
            return null;
        }
    }

    /** Passes on every message the worker has queued; false when it asked to stop. */
    private boolean forwardAll(ZMQ.Socket inbox, ZMQ.Socket shell, ZMQ.Socket iopub) {
        boolean keepRunning = true;
        for (List<byte[]> frames = receive(inbox, ZMQ.DONTWAIT); frames != null;
                frames = receive(inbox, ZMQ.DONTWAIT)) {
            byte route = frames.get(0)[0];
            List<byte[]> message = frames.subList(1, frames.size());
            switch (route) {
                case ROUTE_IOPUB -> send(iopub, message);
                case ROUTE_SHELL -> send(shell, message);
                default -> keepRunning = false;
            }
        }
        return keepRunning;
    }

    /** All frames of one message, or null when {@code flags} say not to wait and none is there. */
    private static List<byte[]> receive(ZMQ.Socket socket, int flags) {
        byte[] first = socket.recv(flags);
        if (first == null) {
            return null;
        }
        List<byte[]> frames = new ArrayList<>(8);
        frames.add(first);
        while (socket.hasReceiveMore()) {
            frames.add(socket.recv(0));
        }
        return frames;
    }

    private static void send(ZMQ.Socket socket, List<byte[]> frames) {
        int last = frames.size() - 1;
        for (int i = 0; i < last; i++) {
            socket.sendMore(frames.get(i));
        }
        socket.send(frames.get(last), 0);
    }

    /** Messages sent straight to the sockets, from the thread that owns them. */
    private final class DirectOut implements MessageOut {
        private final ZMQ.Socket replies;
        private final ZMQ.Socket iopub;

        DirectOut(ZMQ.Socket replies, ZMQ.Socket iopub) {
            this.replies = replies;
            this.iopub = iopub;
        }

        @Override
        public void publish(Request cause, String type, JsonContent content) {
            send(iopub, wire.encode(MessageOut.topic(type), type, cause.header(), content.toBytes()));
        }

        @Override
        public void reply(Request request, String type, JsonContent content) {
            send(replies, wire.encode(request.identities(), type, request.header(), content.toBytes()));
        }
    }

    /** Messages from the worker thread, handed to the owning thread through the inbox. */
    private final class WorkerOut implements MessageOut {
        private final ZContext zmq;
        private ZMQ.Socket push; // created on, and used only by, the worker thread

        WorkerOut(ZContext zmq) {
            this.zmq = zmq;
        }

        @Override
        public void publish(Request cause, String type, JsonContent content) {
            forward(ROUTE_IOPUB, wire.encode(MessageOut.topic(type), type, cause.header(),
                    content.toBytes()));
        }

        @Override
        public void reply(Request request, String type, JsonContent content) {
            forward(ROUTE_SHELL, wire.encode(request.identities(), type, request.header(),
                    content.toBytes()));
        }

        void stopKernel() {
            forward(ROUTE_STOP, List.of());
        }

        private void forward(byte route, List<byte[]> frames) {
            if (push == null) {
                push = zmq.createSocket(SocketType.PUSH);
                push.connect(inboxAddress);
            }
            List<byte[]> routed = new ArrayList<>(frames.size() + 1);
            routed.add(new byte[] {route});
            routed.addAll(frames);
            send(push, routed);
        }
    }
}
