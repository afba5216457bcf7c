"""Runs a notebook with nbclient, as a notebook front end would, through a kernelspec.

  run_notebook.py NOTEBOOK KERNEL_NAME            run it; any failed cell is an error
  run_notebook.py --fake-engine FOLDER KERNEL_NAME  write a small notebook for the fake
                                                  engine in FOLDER, run it, check outputs

The kernelspec is looked up in JUPYTER_DATA_DIR / JUPYTER_PATH, which the test sets.
"""
import os
import sys

import nbformat
from nbclient import NotebookClient


def run(notebook, kernel_name, allow_errors=False):
    client = NotebookClient(notebook, kernel_name=kernel_name, timeout=60,
                            startup_timeout=120, allow_errors=allow_errors)
    client.execute()
    return notebook


def fake_engine(folder, kernel_name):
    notebook = nbformat.v4.new_notebook()
    notebook.cells = [nbformat.v4.new_code_cell(code) for code in
                      ["echo proof load survey", "table", "figure", "verdict", "oops", "echo after"]]
    path = os.path.join(folder, "fake-engine.ipynb")
    nbformat.write(notebook, path)
    done = run(nbformat.read(path, as_version=4), kernel_name, allow_errors=True)
    echo, table, figure, verdict, oops, after = [cell.outputs for cell in done.cells]
    # nbformat 4 output types (nbformat documentation, "The Notebook file format").
    assert echo[0].output_type == "stream" and echo[0].text == "proof load survey\n", echo
    assert "text/html" in table[0].data and "text/plain" in table[0].data, table
    assert {"image/svg+xml", "image/png"} <= set(figure[0].data), figure
    assert verdict[0].output_type == "execute_result" and "text/markdown" in verdict[0].data, verdict
    assert oops[0].output_type == "error" and oops[0].ename == "NameError", oops
    assert after[0].text == "after\n", after
    assert done.metadata.get("language_info", {}).get("name") == "rosetra", done.metadata
    nbformat.validate(done)


def main():
    if sys.argv[1] == "--fake-engine":
        fake_engine(sys.argv[2], sys.argv[3])
    else:
        run(nbformat.read(sys.argv[1], as_version=4), sys.argv[2])
    print("ok")


main()
