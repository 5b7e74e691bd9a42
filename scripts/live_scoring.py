"""Starts a Release build of Ledgerline on a temporary SQLite file and sets up an invented lender
(Fernhill Mutual Credit) with three approved 20-characteristic versions and a plan: champion 1,
challenger 2 at 20 %, shadow 3. Used by scripts/crash-test and scripts/bench-scoring."""

import json
import os
import random
import secrets
import socket
import subprocess
import time
import urllib.error
import urllib.request

ROOT = os.path.dirname(os.path.dirname(os.path.abspath(__file__)))
DLL = os.path.join(ROOT, "src/Ledgerline.Api/bin/Release/net10.0/Ledgerline.Api.dll")
KEY = "fernhill-personal-loans"

NUMERIC = [f"numeric{i:02d}" for i in range(12)]
CATEGORICAL = [f"category{i:02d}" for i in range(8)]
CATEGORIES = ["owner", "mortgage", "tenant", "with-family", "other"]


def free_port():
    with socket.socket() as s:
        s.bind(("127.0.0.1", 0))
        return s.getsockname()[1]


def build():
    subprocess.run(["dotnet", "build", os.path.join(ROOT, "src/Ledgerline.Api"), "-c", "Release", "-nologo", "-v", "q"], check=True)


def start(database, port, admin_key, log_path, postgres=None):
    """Starts the service on a SQLite file, or, given a PostgreSQL connection string, on that."""
    store = {"ConnectionStrings__Ledgerline": f"Data Source={database}"} if postgres is None else {
        "Database__Provider": "Postgres", "ConnectionStrings__Ledgerline": postgres}
    env = dict(os.environ, **store,
               Access__BootstrapAdminKey=admin_key,
               ASPNETCORE_ENVIRONMENT="Production",
               Logging__LogLevel__Default="Warning")
    log = open(log_path, "ab")
    process = subprocess.Popen(["dotnet", DLL, "--urls", f"http://127.0.0.1:{port}"], env=env, stdout=log, stderr=log,
                               cwd=os.path.dirname(database))
    deadline = time.time() + 60
    while time.time() < deadline:
        try:
            with urllib.request.urlopen(f"http://127.0.0.1:{port}/health", timeout=1) as r:
                if r.status == 200:
                    return process
        except (urllib.error.URLError, ConnectionError, TimeoutError):
            time.sleep(0.2)
    process.kill()
    raise RuntimeError("the service did not become healthy within 60 s; see " + log_path)


def call(port, method, path, key, body=None, headers=None):
    data = None if body is None else json.dumps(body).encode()
    request = urllib.request.Request(f"http://127.0.0.1:{port}{path}", data=data, method=method)
    request.add_header("Authorization", f"Bearer {key}")
    request.add_header("Content-Type", "application/json")
    for k, v in (headers or {}).items():
        request.add_header(k, v)
    try:
        with urllib.request.urlopen(request, timeout=30) as r:
            return r.status, json.loads(r.read() or b"null")
    except urllib.error.HTTPError as e:
        return e.code, json.loads(e.read() or b"null")


def version(seed):
    rng = random.Random(seed)
    characteristics = []
    for i, name in enumerate(NUMERIC):
        edges = sorted(rng.sample(range(1, 100), 4))
        bins = [{"upTo": edges[0], "points": rng.randint(10, 60)}]
        bins += [{"from": a, "upTo": b, "points": rng.randint(10, 60)} for a, b in zip(edges, edges[1:])]
        bins.append({"from": edges[-1], "points": rng.randint(10, 60)})
        characteristics.append({"name": name, "type": "numeric", "reasonCode": f"N{i:02d}", "reasonText": f"Numeric factor {i}",
                                "bins": bins, "missingPoints": rng.randint(10, 40)})
    for i, name in enumerate(CATEGORICAL):
        bins = [{"values": [c], "points": rng.randint(10, 60)} for c in CATEGORIES[:4]]
        characteristics.append({"name": name, "type": "categorical", "reasonCode": f"C{i:02d}", "reasonText": f"Category factor {i}",
                                "bins": bins, "otherPoints": rng.randint(10, 40)})
    return {"description": f"Fernhill build {seed}", "basePoints": 0,
            "scaling": {"baseScore": 600, "baseOdds": 50, "pointsToDoubleOdds": 20}, "reasonCodeCount": 4,
            "characteristics": characteristics,
            "decisionBands": [{"minScore": 720, "decision": "approve"}, {"minScore": 660, "decision": "refer"}, {"decision": "decline"}]}


def application(rng, application_id):
    values = {n: rng.randint(0, 110) for n in NUMERIC}
    values.update({n: rng.choice(CATEGORIES) for n in CATEGORICAL})
    return {"applicationId": application_id, "applicationDate": "2026-01-15", "characteristics": values}


def set_up(port, admin_key):
    """Creates keys, the family, three approved versions and the plan; returns the scoring key."""
    keys = {}
    for role in ["analyst", "risk", "scoring"]:
        status, body = call(port, "POST", "/access/keys", admin_key, {"name": f"fernhill {role}", "roles": [role]})
        assert status == 201 or status == 200, (status, body)
        keys[role] = body["key"]
    status, body = call(port, "POST", "/scorecards", keys["analyst"], {
        "key": KEY, "name": "Fernhill Mutual Credit personal loans",
        "outcomeDefinition": {"badDaysPastDue": 90, "indeterminateDaysPastDue": 30, "performanceWindowMonths": 12}})
    assert status == 201, (status, body)
    rng = random.Random(7)
    for seed in (1, 2, 3):
        status, body = call(port, "POST", f"/scorecards/{KEY}/versions", keys["analyst"], version(seed))
        assert status == 201, (status, body)
        number = body["version"]
        records = [{"characteristics": application(rng, "x")["characteristics"], "bad": rng.random() < 0.1} for _ in range(200)]
        status, body = call(port, "PUT", f"/scorecards/{KEY}/versions/{number}/baseline", keys["analyst"], {"records": records})
        assert status in (200, 201), (status, body)
        status, body = call(port, "POST", f"/scorecards/{KEY}/versions/{number}/approval", keys["risk"])
        assert status == 200, (status, body)
    status, body = call(port, "PUT", f"/scorecards/{KEY}/traffic", keys["risk"], {
        "champion": 1, "challengers": [{"version": 2, "share": 0.2}], "shadows": [3], "reason": "Benchmark plan"})
    assert status == 200, (status, body)
    return keys["scoring"]


def new_admin_key():
    return "bench-admin-" + secrets.token_hex(16)
