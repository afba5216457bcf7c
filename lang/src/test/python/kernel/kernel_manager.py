"""The kernel started from its kernelspec by a KernelManager, as notebook servers do:
interrupt by message, then a clean shutdown with exit status 0."""
import sys
import time

from jupyter_client import KernelManager

from kernel_driver import iopub_until_idle, shell_reply


def main():
    manager = KernelManager(kernel_name=sys.argv[1])
    manager.start_kernel()
    client = manager.client()
    client.start_channels()
    try:
        client.wait_for_ready(timeout=120)
        msg_id = client.execute("long")
        while True:
            message = client.get_iopub_msg(timeout=20)
            if message["parent_header"].get("msg_id") == msg_id and message["msg_type"] == "stream":
                break
        # Kernel specs, interrupt_mode "message": the manager sends interrupt_request on control.
        manager.interrupt_kernel()
        reply = shell_reply(client, msg_id, timeout=10)
        assert reply["content"]["status"] == "error" and reply["content"]["ename"] == "Interrupted", reply
        iopub_until_idle(client, msg_id)
        assert manager.is_alive()
        # Messaging protocol 5.3, "Kernel shutdown": a graceful shutdown asks, then waits for exit.
        process = manager.provisioner.process
        started = time.monotonic()
        manager.shutdown_kernel(now=False)
        assert time.monotonic() - started < 5, "the kernel took long to exit"
        assert process.returncode == 0, "exit status %r (killed, not a clean exit?)" % process.returncode
    finally:
        client.stop_channels()
    print("ok")


main()
