"""Interrupts the real kernel while a cell reads a long measured series.

  interrupt_series.py KERNEL_NAME FOLDER

FOLDER holds long.csv; the kernel starts in FOLDER. The cell must end with an error named
"Interrupted" soon after the interrupt (Jupyter messaging protocol 5.3, "Kernel interrupt":
interrupt_request on the control channel), and the next cell must run normally.
"""
import sys
import time

from jupyter_client import KernelManager

CELL = """
material steel {
  E  = 200 GPa
  nu = 0.3
}
gauge g {
  factor = 2.0
}
rosette r {
  layout   = rectangular
  gauge    = g
  material = steel
}
series long_run from "long.csv" {
  time = "t_s" s
  r    = "g1", "g2", "g3" ue
}
let peak = max(r.von_mises[long_run])
"""


def main():
    name, folder = sys.argv[1], sys.argv[2]
    km = KernelManager(kernel_name=name)
    km.start_kernel(cwd=folder)
    kc = km.client()
    kc.start_channels()
    try:
        kc.wait_for_ready(timeout=120)
        msg_id = kc.execute(CELL)
        time.sleep(0.3)
        sent = time.time()
        km.interrupt_kernel()
        ename = None
        while True:
            m = kc.get_iopub_msg(timeout=60)
            if m["parent_header"].get("msg_id") != msg_id:
                continue
            if m["msg_type"] == "error":
                ename = m["content"]["ename"]
            if m["msg_type"] == "status" and m["content"]["execution_state"] == "idle":
                break
        waited = time.time() - sent
        assert ename == "Interrupted", "the cell ended with %r" % ename
        assert waited < 10, "the cell stopped %.1f s after the interrupt" % waited
        reply = kc.execute_interactive("let x = 1 MPa", timeout=60)
        assert reply["content"]["status"] == "ok", reply["content"]
        print("ok: stopped %.2f s after the interrupt" % waited)
    finally:
        kc.stop_channels()
        km.shutdown_kernel(now=True)


main()
