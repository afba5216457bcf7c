package org.rosetra.lang.kernel;

import java.io.PrintStream;
import java.util.List;
import org.zeromq.ZMQ;

/**
 * The shell thread: it owns the shell socket and answers each request in arrival order,
 * running cells itself, so a trivial cell costs no hand-over between threads. A second
 * socket, {@code wake}, lets the control thread tell it to stop.
 */
final class ShellLoop implements Runnable {
    private final ZMQ.Socket shell;
    private final ZMQ.Socket wake;
    private final ZMQ.Poller poller;
    private final WireFormat wire;
    private final ShellRequests requests;
    private final MessageOut out;
    private final PrintStream log;
    private final Runnable onShutdownRequest;
    private final StayAwake awake;

    /** All sockets given here are handed over to the shell thread. */
    ShellLoop(ZMQ.Socket shell, ZMQ.Socket wake, ZMQ.Poller poller, WireFormat wire,
            ShellRequests requests, Publisher iopub, PrintStream log, Runnable onShutdownRequest,
            StayAwake awake) {
        this.shell = shell;
        this.wake = wake;
        this.poller = poller;
        this.wire = wire;
        this.requests = requests;
        this.out = new SocketOut(wire, shell, iopub);
        this.log = log;
        this.onShutdownRequest = onShutdownRequest;
        this.awake = awake;
    }

    @Override
    public void run() {
        int shellIndex = poller.register(shell, ZMQ.Poller.POLLIN);
        int wakeIndex = poller.register(wake, ZMQ.Poller.POLLIN);
        try {
            while (poller.poll(-1) >= 0 && !poller.pollin(wakeIndex)) {
                if (poller.pollin(shellIndex) && !serve(Frames.receive(shell, 0))) {
                    onShutdownRequest.run();
                    return;
                }
            }
        } finally {
            poller.close();
        }
    }

    /** Answers one request; false after a shutdown request. */
    private boolean serve(List<byte[]> frames) {
        awake.begin();
        try {
            return answerOrLog(frames);
        } finally {
            out.flush(); // the status idle, at the end of each request
            awake.end();
        }
    }

    private boolean answerOrLog(List<byte[]> frames) {
        try {
            return answer(frames);
        } catch (RuntimeException e) {
            // A request the kernel cannot handle must not end the shell thread.
            log.println("rosetra kernel: failed to answer a shell request");
            e.printStackTrace(log);
            return true;
        }
    }

    private boolean answer(List<byte[]> frames) {
        Request request = Kernel.decodeOrLog(wire, frames, "shell", log);
        if (request == null) {
            return true;
        }
        boolean failedCell = requests.handle(request, out);
        if (failedCell && !abortQueuedCells()) {
            return false;
        }
        return !request.type().equals("shutdown_request");
    }

    /**
     * After a failed cell, the cells already sent behind it are not run (messaging protocol
     * 5.3, "Execute": stop_on_error); other queued requests are answered as usual.
     * False when one of them was a shutdown request.
     */
    private boolean abortQueuedCells() {
        for (List<byte[]> frames = Frames.receive(shell, ZMQ.DONTWAIT); frames != null;
                frames = Frames.receive(shell, ZMQ.DONTWAIT)) {
            Request request = Kernel.decodeOrLog(wire, frames, "shell", log);
            if (request == null) {
                continue;
            }
            if (request.type().equals("execute_request")) {
                requests.abort(request, out);
            } else {
                requests.handle(request, out);
                if (request.type().equals("shutdown_request")) {
                    return false;
                }
            }
        }
        return true;
    }
}
