"""complete_request and inspect_request."""
from kernel_driver import main, shell_reply


def check(client):
    code = "material s355 {\n  E = 205 GPa\n}\nmoh"
    # Messaging protocol 5.3, "Completion": matches replace cursor_start..cursor_end.
    reply = shell_reply(client, client.complete(code, len(code)))
    content = reply["content"]
    assert reply["msg_type"] == "complete_reply"
    assert content["status"] == "ok"
    assert content["matches"] == ["mohr_circle", "mohr_coulomb"], content["matches"]
    assert content["cursor_start"] == len(code) - 3, content
    assert content["cursor_end"] == len(code), content
    assert content["metadata"] == {}

    # Offsets count characters (code points), not bytes: a µε before the cursor.
    code = "let e = 5 µε  # ros"
    content = shell_reply(client, client.complete(code, len(code)))["content"]
    assert content["matches"] == ["rosette"], content
    assert content["cursor_start"] == len(code) - 3, content

    # Messaging protocol 5.3, "Introspection": found plus a mime bundle.
    code = "let u = von_mises(web_top)"
    reply = shell_reply(client, client.inspect(code, code.index("mises"), detail_level=0))
    content = reply["content"]
    assert reply["msg_type"] == "inspect_reply"
    assert content["status"] == "ok"
    assert content["found"] is True
    assert content["data"]["text/plain"].startswith("von_mises")

    content = shell_reply(client, client.inspect("nothing_here", 3))["content"]
    assert content["found"] is False
    assert content["data"] == {}

    # A cursor outside the code (a front end's mistake) is taken as the nearest end.
    for cursor, expected in ((2 ** 40, 3), (-5, 0)):
        message = client.session.msg("complete_request", {"code": "ros", "cursor_pos": cursor})
        client.shell_channel.send(message)
        content = shell_reply(client, message["header"]["msg_id"])["content"]
        assert content["status"] == "ok" and content["cursor_end"] == expected, content
    assert shell_reply(client, client.kernel_info())["content"]["status"] == "ok"


main(check)
