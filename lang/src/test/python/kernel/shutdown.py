"""shutdown_request on control (or on shell with the argument "shell"): reply, then exit."""
import sys

from kernel_driver import connect, control_reply, iopub_until_idle, shell_reply


def main():
    client = connect(sys.argv[1])
    channel = sys.argv[2] if len(sys.argv) > 2 else "control"
    # Messaging protocol 5.3, "Kernel shutdown": the reply echoes restart.
    if channel == "control":
        msg_id = client.shutdown(restart=True)
        reply = control_reply(client, msg_id)
    else:
        message = client.session.msg("shutdown_request", {"restart": False})
        client.shell_channel.send(message)
        msg_id = message["header"]["msg_id"]
        reply = shell_reply(client, msg_id)
    assert reply["msg_type"] == "shutdown_reply"
    assert reply["content"]["status"] == "ok"
    assert reply["content"]["restart"] is (channel == "control"), reply["content"]
    iopub_until_idle(client, msg_id)
    client.stop_channels()
    print("ok")


main()
