"""A cell with a mistake: status error with a readable traceback; the kernel goes on."""
from kernel_driver import iopub_until_idle, main, of_type, run_cell, shell_reply


def check(client):
    # Messaging protocol 5.3, "Request-Reply" (status error fields) and "Execution errors".
    reply, outputs = run_cell(client, "oops")
    content = reply["content"]
    assert content["status"] == "error", content
    assert content["ename"] == "NameError"
    assert content["evalue"] == "no material named s999"
    assert any("^" in line for line in content["traceback"]), content["traceback"]
    assert "line 1, column 12" in content["traceback"][0]
    [error] = of_type(outputs, "error")
    assert error["content"]["traceback"] == content["traceback"]

    # A fault inside the engine is reported like a mistake, not a dead kernel.
    reply, outputs = run_cell(client, "crash")
    assert reply["content"]["status"] == "error"
    assert reply["content"]["ename"] == "InternalError"

    reply, outputs = run_cell(client, "echo still here")
    assert reply["content"]["status"] == "ok"

    # Messaging protocol 5.3, "Execute" (stop_on_error): requests queued behind a failed
    # cell are aborted.
    failing = client.execute("slow oops")
    queued = client.execute("echo never run")
    assert shell_reply(client, failing)["content"]["status"] == "error"
    assert shell_reply(client, queued)["content"]["status"] == "aborted"
    iopub_until_idle(client, queued)

    # With stop_on_error false the next cell runs.
    failing = client.execute("slow oops", stop_on_error=False)
    queued = client.execute("echo runs anyway")
    assert shell_reply(client, failing)["content"]["status"] == "error"
    assert shell_reply(client, queued)["content"]["status"] == "ok"


main(check)
