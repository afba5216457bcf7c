package org.rosetra.lang.kernel;

import java.io.OutputStream;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.util.List;
import org.zeromq.SocketType;
import org.zeromq.ZContext;
import org.zeromq.ZMQ;

/**
 * Sends trivial cells through the kernel's own message path once, on private loopback
 * sockets, before the kernel reports ready. The JVM compiles hot code only after it has run
 * many times; without this the first few hundred cells of a notebook each cost
 * milliseconds more (bench/kernel-roundtrip shows it). Nothing reaches a front end or the
 * language session: the cells go to a do-nothing engine.
 */
final class WarmUp {
    private static final int CELLS = 1500;
    private static final long BUDGET_NANOS = 1_500_000_000L;

    private WarmUp() {}

    /** Runs up to {@link #CELLS} cells or for the time budget, whichever ends first. */
    static int run() {
        PrintStream quiet = new PrintStream(OutputStream.nullOutputStream(), false, StandardCharsets.UTF_8);
        WireFormat wire = new WireFormat(new MessageSigner("warm-up".getBytes(StandardCharsets.UTF_8)), "warm-up");
        ShellRequests requests = new ShellRequests(new IdleEngine(), "warm-up", "warm-up", quiet);
        byte[] content = ((JsonContent) json -> {
            json.writeStringField("code", "let x = 1 MPa");
            json.writeBooleanField("silent", false);
            json.writeBooleanField("store_history", true);
            JsonContent.writeEmptyObject(json, "user_expressions");
        }).toBytes();
        try (ZContext zmq = new ZContext()) {
            ZMQ.Socket kernelSide = zmq.createSocket(SocketType.ROUTER);
            int port = kernelSide.bindToRandomPort("tcp://127.0.0.1");
            ZMQ.Socket iopub = zmq.createSocket(SocketType.PUB);
            int iopubPort = iopub.bindToRandomPort("tcp://127.0.0.1");
            ZMQ.Socket client = zmq.createSocket(SocketType.DEALER);
            client.connect("tcp://127.0.0.1:" + port);
            ZMQ.Socket listener = zmq.createSocket(SocketType.SUB);
            listener.subscribe(new byte[0]);
            listener.connect("tcp://127.0.0.1:" + iopubPort);
            MessageOut out = new SocketOut(wire, kernelSide, new Publisher(iopub));
            ZMQ.Poller poller = zmq.createPoller(1);
            poller.register(kernelSide, ZMQ.Poller.POLLIN);

            long deadline = System.nanoTime() + BUDGET_NANOS;
            int cells = 0;
            while (cells < CELLS && System.nanoTime() < deadline) {
                Frames.send(client, wire.encode(List.of(), "execute_request", JsonContent.EMPTY_OBJECT, content));
                if (poller.poll(1000) <= 0) {
                    break;
                }
                Request request = Kernel.decodeOrLog(wire, Frames.receive(kernelSide, 0), "warm-up", quiet);
                if (request != null) {
                    requests.handle(request, out);
                }
                Frames.receive(client, 0);
                while (Frames.receive(listener, ZMQ.DONTWAIT) != null) {
                    // drained; only the sending and receiving mattered
                }
                cells++;
            }
            poller.close();
            return cells;
        }
    }

    /** An engine that does nothing, so warming up has no effect on any session. */
    private static final class IdleEngine implements CellEngine {
        @Override
        public CellOutcome execute(String code, OutputSink sink) {
            return CellOutcome.shows(MimeBundle.plain(code));
        }

        @Override
        public CompletionResult complete(String code, int cursorPos) {
            return CompletionResult.none(cursorPos);
        }

        @Override
        public InspectionResult inspect(String code, int cursorPos, int detailLevel) {
            return InspectionResult.notFound();
        }

        @Override
        public Completeness isComplete(String code) {
            return Completeness.complete();
        }

        @Override
        public void interrupt() {
            // nothing runs long
        }

        @Override
        public String languageVersion() {
            return "warm-up";
        }
    }
}
