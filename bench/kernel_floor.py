#!/usr/bin/env python3
"""The least a kernel can do: a single-threaded pyzmq kernel that answers kernel_info and
execute requests with the messages a trivial cell causes (busy, execute_input, display_data,
execute_reply, idle) and computes nothing. Timed with bench/kernel-roundtrip --argv, it is
the floor the front end's own library and this machine set for any kernel.

  bench/kernel-roundtrip --no-ipykernel --argv "python3 bench/kernel_floor.py {connection_file}"
"""
import json
import sys

import zmq
from jupyter_client.session import Session


def main(connection_file):
    with open(connection_file) as f:
        info = json.load(f)
    context = zmq.Context()

    def bound(kind, port):
        socket = context.socket(kind)
        socket.bind("tcp://%s:%d" % (info["ip"], info[port]))
        return socket

    shell = bound(zmq.ROUTER, "shell_port")
    control = bound(zmq.ROUTER, "control_port")
    iopub = bound(zmq.PUB, "iopub_port")
    heartbeat = bound(zmq.REP, "hb_port")
    bound(zmq.ROUTER, "stdin_port")
    session = Session(key=info["key"].encode(), signature_scheme=info["signature_scheme"])
    poller = zmq.Poller()
    for socket in (shell, control, heartbeat):
        poller.register(socket, zmq.POLLIN)
    count = 0
    while True:
        for socket, _ in poller.poll():
            if socket is heartbeat:
                heartbeat.send(heartbeat.recv())
                continue
            identities, frames = session.feed_identities(socket.recv_multipart())
            request = session.deserialize(frames)
            kind = request["header"]["msg_type"]
            session.send(iopub, "status", {"execution_state": "busy"}, parent=request)
            if kind == "kernel_info_request":
                session.send(socket, "kernel_info_reply", {
                    "status": "ok", "protocol_version": "5.3", "implementation": "floor",
                    "implementation_version": "0", "language_info": {"name": "floor"}, "banner": ""},
                    parent=request, ident=identities)
            elif kind == "execute_request":
                count += 1
                session.send(iopub, "execute_input",
                             {"code": request["content"]["code"], "execution_count": count}, parent=request)
                session.send(iopub, "display_data",
                             {"data": {"text/plain": "x = 1 MPa"}, "metadata": {}}, parent=request)
                session.send(socket, "execute_reply",
                             {"status": "ok", "execution_count": count, "user_expressions": {}},
                             parent=request, ident=identities)
            elif kind == "shutdown_request":
                session.send(socket, "shutdown_reply", {"status": "ok", "restart": False},
                             parent=request, ident=identities)
                session.send(iopub, "status", {"execution_state": "idle"}, parent=request)
                return
            session.send(iopub, "status", {"execution_state": "idle"}, parent=request)


if __name__ == "__main__":
    main(sys.argv[1])
