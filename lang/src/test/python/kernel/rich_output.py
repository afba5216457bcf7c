"""execute_request with rich output: tables, figures, a markdown value, printed text."""
import base64

from kernel_driver import main, of_type, run_cell


def check(client):
    # Messaging protocol 5.3, "Display Data": data is a mime bundle.
    reply, outputs = run_cell(client, "table")
    assert reply["content"]["status"] == "ok", reply["content"]
    first = reply["content"]["execution_count"]
    assert reply["content"]["user_expressions"] == {}
    [table] = of_type(outputs, "display_data")
    assert table["content"]["data"]["text/html"].startswith("<table>")
    assert "proof" in table["content"]["data"]["text/plain"]
    # Messaging protocol 5.3, "Code inputs": execute_input carries the code and the count.
    [started] = of_type(outputs, "execute_input")
    assert started["content"] == {"code": "table", "execution_count": first}, started["content"]

    reply, outputs = run_cell(client, "figure")
    [figure] = of_type(outputs, "display_data")
    data = figure["content"]["data"]
    assert data["image/svg+xml"].startswith("<svg"), data
    assert base64.b64decode(data["image/png"]).startswith(b"\x89PNG\r\n\x1a\n")
    assert reply["content"]["execution_count"] == first + 1

    # Messaging protocol 5.3, "Execution results": execute_result carries the count.
    reply, outputs = run_cell(client, "verdict")
    [result] = of_type(outputs, "execute_result")
    assert result["content"]["execution_count"] == first + 2
    assert result["content"]["data"]["text/markdown"].startswith("**web_top**")
    assert "passes" in result["content"]["data"]["text/plain"]

    # Messaging protocol 5.3, "Streams".
    reply, outputs = run_cell(client, "echo hello gauges")
    [printed] = of_type(outputs, "stream")
    assert printed["content"] == {"name": "stdout", "text": "hello gauges\n"}, printed["content"]

    # Messaging protocol 5.3, "Execute": silent publishes nothing and stores no history.
    reply, outputs = run_cell(client, "verdict", silent=True)
    assert reply["content"]["status"] == "ok"
    assert reply["content"]["execution_count"] == first + 3
    assert [m["msg_type"] for m in outputs] == ["status", "status"], [m["msg_type"] for m in outputs]

    # store_history=False runs and shows, but does not count.
    reply, outputs = run_cell(client, "verdict", store_history=False)
    assert reply["content"]["execution_count"] == first + 3
    assert len(of_type(outputs, "execute_result")) == 1

    reply, outputs = run_cell(client, "echo counted")
    assert reply["content"]["execution_count"] == first + 4


main(check)
