"""interrupt_request during a long cell; control and heartbeat stay responsive meanwhile."""
import time

import zmq

from kernel_driver import control_reply, main, of_type, run_cell, send_control, shell_reply, iopub_until_idle


def heartbeat_answers(client):
    context = zmq.Context()
    socket = context.socket(zmq.REQ)
    socket.linger = 0
    socket.connect("tcp://%s:%d" % (client.ip, client.hb_port))
    socket.send(b"ping")
    answered = socket.poll(5000) and socket.recv() == b"ping"
    socket.close()
    context.term()
    return answered


def check(client):
    msg_id = client.execute("long")
    # Wait until the cell has started (its first printed line).
    while True:
        message = client.get_iopub_msg(timeout=20)
        if message["parent_header"].get("msg_id") == msg_id and message["msg_type"] == "stream":
            break

    # The control channel answers while the cell runs (messaging protocol 5.3, "Introduction": control
    # "operates on a separate socket, to allow important messages to avoid queueing behind execution requests").
    started = time.monotonic()
    info = control_reply(client, send_control(client, "kernel_info_request", {}), timeout=5)
    assert info["content"]["implementation"] == "rosetra"
    assert time.monotonic() - started < 5, "control waited for the cell (which runs 60 s)"
    # Messaging protocol 5.3, "Heartbeat for kernels": echoes while busy.
    assert heartbeat_answers(client), "no heartbeat during a long cell"

    # Messaging protocol 5.3, "Kernel interrupt": interrupt_request on control, reply {}.
    interrupted_at = time.monotonic()
    reply = control_reply(client, send_control(client, "interrupt_request", {}))
    assert reply["msg_type"] == "interrupt_reply"
    assert reply["content"]["status"] == "ok"

    execute_reply = shell_reply(client, msg_id, timeout=10)
    assert time.monotonic() - interrupted_at < 5, "the cell did not stop soon after the interrupt"
    assert execute_reply["content"]["status"] == "error", execute_reply["content"]
    assert execute_reply["content"]["ename"] == "Interrupted"
    iopub_until_idle(client, msg_id)

    # The next cell starts clean.
    reply, outputs = run_cell(client, "echo after the interrupt")
    assert reply["content"]["status"] == "ok"
    assert of_type(outputs, "stream")[0]["content"]["text"] == "after the interrupt\n"

    # An interrupt with no cell running does no harm.
    reply = control_reply(client, send_control(client, "interrupt_request", {}))
    assert reply["content"]["status"] == "ok"
    reply, outputs = run_cell(client, "verdict")
    assert reply["content"]["status"] == "ok"


main(check)
