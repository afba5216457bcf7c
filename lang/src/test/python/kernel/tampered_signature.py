"""A message with a wrong HMAC, and one with no delimiter, are dropped; the kernel goes on."""
import json
import sys

import zmq
from jupyter_client.session import Session

from kernel_driver import connect, shell_reply


def main():
    connection_file = sys.argv[1]
    with open(connection_file) as f:
        info = json.load(f)
    session = Session(key=info["key"].encode(), signature_scheme=info["signature_scheme"])

    context = zmq.Context()
    shell = context.socket(zmq.DEALER)
    shell.linger = 0
    shell.connect("tcp://%s:%d" % (info["ip"], info["shell_port"]))

    # Messaging protocol 5.3, "The Wire Protocol": [<IDS|MSG>, signature, header, parent, metadata, content].
    request = session.msg("kernel_info_request", {})
    frames = session.serialize(request)
    delimiter = frames.index(b"<IDS|MSG>")
    signature = frames[delimiter + 1]
    frames[delimiter + 1] = (b"0" if signature[:1] != b"0" else b"1") + signature[1:]
    shell.send_multipart(frames)
    assert shell.poll(1500) == 0, "the kernel answered a message with a wrong signature"

    # Tampered content under the original signature.
    frames = session.serialize(session.msg("kernel_info_request", {}))
    frames[-1] = b'{"tampered": true}'
    shell.send_multipart(frames)
    assert shell.poll(500) == 0, "the kernel answered a message whose content was changed"

    # Not a protocol message at all.
    shell.send_multipart([b"hello", b"there"])
    assert shell.poll(500) == 0

    # A correctly signed request on the same socket is still answered.
    shell.send_multipart(session.serialize(session.msg("kernel_info_request", {})))
    assert shell.poll(5000) != 0, "the kernel stopped answering"
    reply = session.deserialize(session.feed_identities(shell.recv_multipart())[1])
    assert reply["msg_type"] == "kernel_info_reply"
    shell.close()
    context.term()

    client = connect(connection_file)
    reply = shell_reply(client, client.kernel_info())
    assert reply["content"]["implementation"] == "rosetra"
    client.stop_channels()
    print("ok")


main()
