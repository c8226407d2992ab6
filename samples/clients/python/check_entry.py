"""Checks one entry file on a running ConsistencyHost with the standard Python gRPC tooling.

Usage: python3 check_entry.py PROTO_DIR HOST:PORT ENTRY.json
Prints the report in the proto JSON mapping. Exits 0 when no finding is an error, 1 when one is, 2 when
the host refuses the entry (INVALID_ARGUMENT: the field path and the reason go to stderr).

Needs grpcio and grpcio-tools (Debian: python3-grpcio, python3-grpc-tools). The stubs are generated from
proto/ at start into a temporary folder, so the example always matches the contract it is run against.
"""
import importlib
import os
import sys
import tempfile

import grpc
import grpc_tools
from google.protobuf import json_format
from grpc_tools import protoc

PROTOS = [f"consistencyhost/v1/{name}.proto" for name in ("entry", "report", "check")]
# The HTTP rules' imports, vendored in proto/google/api; `google` is a namespace package, so the generated
# google.api modules sit beside the installed google.protobuf.
PROTOS += ["google/api/http.proto", "google/api/annotations.proto"]


def load_stubs(proto_dir: str):
    out_dir = tempfile.mkdtemp(prefix="consistencyhost-stubs-")
    well_known = os.path.join(os.path.dirname(grpc_tools.__file__), "_proto")
    args = ["grpc_tools.protoc", f"-I{proto_dir}", f"-I{well_known}", f"--python_out={out_dir}", f"--grpc_python_out={out_dir}", *PROTOS]
    if protoc.main(args) != 0:
        raise SystemExit("protoc could not compile the contract in " + proto_dir)
    sys.path.insert(0, out_dir)
    modules = ("check_pb2", "check_pb2_grpc", "report_pb2")
    return tuple(importlib.import_module("consistencyhost.v1." + name) for name in modules)


def main() -> int:
    if len(sys.argv) != 4:
        print(__doc__, file=sys.stderr)
        return 2
    proto_dir, address, entry_file = sys.argv[1:]
    check_pb2, check_grpc, report_pb2 = load_stubs(proto_dir)
    with open(entry_file, encoding="utf-8") as f:
        request = json_format.Parse(f.read(), check_pb2.CheckEntryRequest())

    with grpc.insecure_channel(address) as channel:
        try:
            reply = check_grpc.EntryCheckStub(channel).CheckEntry(request, timeout=60)
        except grpc.RpcError as error:
            if error.code() == grpc.StatusCode.INVALID_ARGUMENT:
                print(f"refused: {error.details()}", file=sys.stderr)
                return 2
            raise

    print(json_format.MessageToJson(reply))
    return 1 if reply.highest_severity == report_pb2.error else 0


if __name__ == "__main__":
    sys.exit(main())
