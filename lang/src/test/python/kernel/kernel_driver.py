"""Shared helpers for the scripts that drive a Rosetra kernel through jupyter_client.

Each script takes the connection file as its first argument, checks one behaviour with
plain asserts, and exits 0 when every check holds. Protocol facts checked are from the
Jupyter messaging protocol 5.3 (jupyter_client documentation, "Messaging in Jupyter").
"""
import sys
import time

from jupyter_client import BlockingKernelClient

TIMEOUT = 20


def connect(connection_file):
    client = BlockingKernelClient()
    client.load_connection_file(connection_file)
    client.start_channels()
    client.wait_for_ready(timeout=TIMEOUT)
    return client


def iopub_until_idle(client, msg_id, timeout=TIMEOUT):
    """Every IOPub message caused by request msg_id, up to and including status idle."""
    messages = []
    deadline = time.monotonic() + timeout
    while True:
        remaining = deadline - time.monotonic()
        assert remaining > 0, "no status idle for %s; saw %r" % (msg_id, [m["msg_type"] for m in messages])
        message = client.get_iopub_msg(timeout=remaining)
        if message["parent_header"].get("msg_id") != msg_id:
            continue
        messages.append(message)
        if message["msg_type"] == "status" and message["content"]["execution_state"] == "idle":
            return messages


def shell_reply(client, msg_id, timeout=TIMEOUT):
    deadline = time.monotonic() + timeout
    while True:
        reply = client.get_shell_msg(timeout=max(0.01, deadline - time.monotonic()))
        if reply["parent_header"].get("msg_id") == msg_id:
            return reply


def control_reply(client, msg_id, timeout=TIMEOUT):
    deadline = time.monotonic() + timeout
    while True:
        reply = client.get_control_msg(timeout=max(0.01, deadline - time.monotonic()))
        if reply["parent_header"].get("msg_id") == msg_id:
            return reply


def run_cell(client, code, **options):
    """Runs one cell; returns (execute_reply, the IOPub messages it caused)."""
    msg_id = client.execute(code, **options)
    reply = shell_reply(client, msg_id)
    outputs = iopub_until_idle(client, msg_id)
    return reply, outputs


def of_type(messages, msg_type):
    return [m for m in messages if m["msg_type"] == msg_type]


def send_control(client, msg_type, content):
    message = client.session.msg(msg_type, content)
    client.control_channel.send(message)
    return message["header"]["msg_id"]


def main(check):
    """Runs check(client) against the kernel named on the command line."""
    client = connect(sys.argv[1])
    try:
        check(client)
    finally:
        client.stop_channels()
    print("ok")
