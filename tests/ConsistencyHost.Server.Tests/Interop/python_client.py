"""Interop check: a Python gRPC client, with stubs generated from proto/ by grpc_tools, calls the host.

Usage: python_client.py PROTO_DIR PORT
Prints one JSON object with what the host answered; exits non-zero on any unexpected reply.
Uses only Debian's python3-grpcio and python3-grpc-tools (run with /usr/bin/python3).
"""
import importlib
import json
import os
import sys
import tempfile

import grpc
import grpc_tools
from google.protobuf import wrappers_pb2
from grpc_tools import protoc


def generate_stubs(proto_dir: str, out_dir: str) -> None:
    # google/api/{http,annotations}.proto are vendored in proto/ for the HTTP rules; their python modules are
    # generated here too (Debian ships no googleapis-common-protos), and `google` is a namespace package.
    files = [f"consistencyhost/v1/{name}.proto" for name in ("entry", "report", "check")]
    files += ["google/api/http.proto", "google/api/annotations.proto"]
    well_known = os.path.join(os.path.dirname(grpc_tools.__file__), "_proto")
    status = protoc.main(["grpc_tools.protoc", f"-I{proto_dir}", f"-I{well_known}", f"--python_out={out_dir}", f"--grpc_python_out={out_dir}", *files])
    if status != 0:
        raise SystemExit(f"protoc failed with status {status}")


def main() -> int:
    proto_dir, port = sys.argv[1], int(sys.argv[2])
    out_dir = tempfile.mkdtemp(prefix="ch-stubs-")
    generate_stubs(proto_dir, out_dir)
    sys.path.insert(0, out_dir)
    check_pb2 = importlib.import_module("consistencyhost.v1.check_pb2")
    entry_pb2 = importlib.import_module("consistencyhost.v1.entry_pb2")
    check_grpc = importlib.import_module("consistencyhost.v1.check_pb2_grpc")

    with grpc.insecure_channel(f"127.0.0.1:{port}") as channel:
        stub = check_grpc.EntryCheckStub(channel)
        rules = stub.ListRules(check_pb2.ListRulesRequest(), timeout=60)

        # 4'-methoxyacetophenone with a 1H list that does not state its solvent (invented entry id).
        request = check_pb2.CheckEntryRequest(entry_id="AIS-LQ-PY01", structure=entry_pb2.Structure(smiles="COc1ccc(cc1)C(C)=O"))
        spectrum = request.spectra.add(nucleus="1H", frequency_mhz=wrappers_pb2.DoubleValue(value=400))
        spectrum.peaks.peaks.add(shift_ppm=wrappers_pb2.DoubleValue(value=3.87), multiplicity="s",
                                  proton_count=wrappers_pb2.DoubleValue(value=3))
        reply = stub.CheckEntry(request, timeout=60)

        bad = check_pb2.CheckEntryRequest(entry_id="AIS-LQ-PY02")
        bad.spectra.add(nucleus="1H", frequency_mhz=wrappers_pb2.DoubleValue(value=400))  # no data form at all
        try:
            stub.CheckEntry(bad, timeout=60)
            bad_status = "OK"
        except grpc.RpcError as error:
            bad_status = error.code().name

    print(json.dumps({
        "rules": [rule.id for rule in rules.rules],
        "entryId": reply.entry_id,
        "codes": [finding.code for finding in reply.findings],
        "severities": [finding.severity for finding in reply.findings],
        "badRequestStatus": bad_status,
    }))
    return 0


if __name__ == "__main__":
    sys.exit(main())
