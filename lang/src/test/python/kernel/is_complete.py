"""is_complete_request: complete, incomplete with an indent, invalid."""
from kernel_driver import main, shell_reply


def verdict(client, code):
    reply = shell_reply(client, client.is_complete(code))
    assert reply["msg_type"] == "is_complete_reply"
    return reply["content"]


def check(client):
    # Messaging protocol 5.3, "Code completeness".
    content = verdict(client, "material m {")
    assert content["status"] == "incomplete", content
    assert content["indent"] == "  ", content
    assert verdict(client, "let x = 1 MPa") == {"status": "complete"}
    assert verdict(client, "material m {\n  E = 205 GPa\n}") == {"status": "complete"}
    assert verdict(client, "}") == {"status": "invalid"}


main(check)
