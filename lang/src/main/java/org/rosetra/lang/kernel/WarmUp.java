package org.rosetra.lang.kernel;

import java.io.OutputStream;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.util.List;
import org.zeromq.SocketType;
import org.zeromq.ZContext;
import org.zeromq.ZMQ;

/**
 * Sends trivial cells through the kernel's own message path, on private loopback sockets,
 * into a throwaway engine, before the kernel reports ready. The JVM compiles hot code only
 * after it has run many times; without this the first few hundred cells of a notebook each
 * cost a millisecond or more extra (bench/kernel-roundtrip's cells taken 100 at a time, with
 * the optimising compiler on: medians 3.1-4.3 ms for the first 300, 2.2-2.5 ms for the last
 * 400 of 1500). Nothing reaches a front end or the user's session.
 */
final class WarmUp {
    private static final int CELLS = 1500;
    private static final long BUDGET_NANOS = 1_500_000_000L;

    private WarmUp() {}

    /** Through a do-nothing engine: warms the message path only. */
    static int run() {
        return run(new IdleEngine());
    }

    /**
     * Runs up to {@link #CELLS} cells through {@code scratch} (an engine used for nothing
     * else) or for the time budget, whichever ends first.
     */
    static int run(CellEngine scratch) {
        PrintStream quiet = new PrintStream(OutputStream.nullOutputStream(), false, StandardCharsets.UTF_8);
        WireFormat wire = new WireFormat(new MessageSigner("warm-up".getBytes(StandardCharsets.UTF_8)), "warm-up");
        ShellRequests requests = new ShellRequests(scratch, "warm-up", "warm-up", quiet);
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
            Publisher publisher = new Publisher(iopub);
            MessageOut out = new SocketOut(wire, kernelSide, publisher);
            ZMQ.Poller poller = zmq.createPoller(1);
            poller.register(kernelSide, ZMQ.Poller.POLLIN);

            long deadline = System.nanoTime() + BUDGET_NANOS;
            int cells = 0;
            while (cells < CELLS && System.nanoTime() < deadline) {
                Frames.send(client, wire.encode(List.of(), "execute_request", JsonContent.EMPTY_OBJECT, cell(cells)));
                if (poller.poll(1000) <= 0) {
                    break;
                }
                Request request = Kernel.decodeOrLog(wire, Frames.receive(kernelSide, 0), "warm-up", quiet);
                if (request != null) {
                    requests.handle(request, out);
                    out.flush();
                }
                Frames.receive(client, 0);
                while (Frames.receive(listener, ZMQ.DONTWAIT) != null) {
                    // drained; only the sending and receiving mattered
                }
                cells++;
            }
            poller.close();
            publisher.stop();
            return cells;
        }
    }

    /** A small cell: a definition with a unit, or one computed from it. */
    private static byte[] cell(int index) {
        String code = index % 2 == 0 ? "let x = " + (index % 97 + 1) + " MPa" : "let y = 2 * x";
        return ((JsonContent) json -> {
            json.writeStringField("code", code);
            json.writeBooleanField("silent", false);
            json.writeBooleanField("store_history", true);
            JsonContent.writeEmptyObject(json, "user_expressions");
        }).toBytes();
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
