"""kernel_info_request / kernel_info_reply, with status busy and idle around it."""
from kernel_driver import iopub_until_idle, main, of_type, shell_reply


def check(client):
    msg_id = client.kernel_info()
    reply = shell_reply(client, msg_id)
    content = reply["content"]
    # Messaging protocol 5.3, "Kernel info": the reply's fields.
    assert reply["msg_type"] == "kernel_info_reply", reply["msg_type"]
    assert content["status"] == "ok"
    assert content["protocol_version"].startswith("5."), content["protocol_version"]
    assert content["implementation"] == "rosetra"
    assert content["implementation_version"]
    language = content["language_info"]
    assert language["name"] == "rosetra"
    assert language["version"] == "0.1.0"
    assert language["mimetype"] == "text/x-rosetra"
    assert language["file_extension"] == ".strain"
    assert "Rosetra" in content["banner"]
    assert content["help_links"] == []
    # Messaging protocol 5.3, "Request-Reply": busy first, idle last, on IOPub.
    states = [m["content"]["execution_state"] for m in of_type(iopub_until_idle(client, msg_id), "status")]
    assert states == ["busy", "idle"], states
    assert reply["header"]["version"].startswith("5."), reply["header"]


main(check)
