-- Schema version 1 of a BenchRunner result file. Described in docs/storage.md.
-- Timestamps are text, ISO 8601 in UTC with millisecond precision and a trailing Z
-- (2025-03-14T09:30:00.000Z), so they sort as text and SQLite's date functions read them.

CREATE TABLE runs (
    id               INTEGER PRIMARY KEY,
    mode             TEXT    NOT NULL CHECK (mode IN ('single', 'tuning', 'batch')),
    plan_name        TEXT    NOT NULL,
    plan_text        TEXT    NOT NULL,
    plan_sha256      TEXT    NOT NULL CHECK (length(plan_sha256) = 64 AND plan_sha256 NOT GLOB '*[^0-9a-f]*'),
    bench_name       TEXT,
    bench_text       TEXT,
    status           TEXT    NOT NULL CHECK (status IN ('running', 'passed', 'failed', 'error', 'interrupted', 'stopped')),
    operator         TEXT,
    dut_serial       TEXT,
    lot              TEXT,
    is_retest        INTEGER NOT NULL DEFAULT 0 CHECK (is_retest IN (0, 1)),
    software_version TEXT    NOT NULL,
    host             TEXT    NOT NULL,
    started_utc      TEXT    NOT NULL
        CHECK (started_utc GLOB '[0-9][0-9][0-9][0-9]-[0-9][0-9]-[0-9][0-9]T[0-9][0-9]:[0-9][0-9]:[0-9][0-9].[0-9][0-9][0-9]Z'),
    ended_utc        TEXT
        CHECK (ended_utc IS NULL OR ended_utc GLOB '[0-9][0-9][0-9][0-9]-[0-9][0-9]-[0-9][0-9]T[0-9][0-9]:[0-9][0-9]:[0-9][0-9].[0-9][0-9][0-9]Z'),
    error_message    TEXT,
    notes            TEXT,
    extra_json       TEXT    CHECK (extra_json IS NULL OR json_valid(extra_json)),
    -- A running run has no end; a finished one has.
    CHECK ((status = 'running') = (ended_utc IS NULL))
);

CREATE INDEX runs_by_serial ON runs (dut_serial, started_utc);
CREATE INDEX runs_by_lot ON runs (lot, started_utc);
CREATE INDEX runs_by_start ON runs (started_utc);
CREATE INDEX runs_running ON runs (status) WHERE status = 'running';

CREATE TABLE instruments (
    id                INTEGER PRIMARY KEY,
    run_id            INTEGER NOT NULL REFERENCES runs (id) ON DELETE CASCADE,
    role              TEXT    NOT NULL,
    kind              TEXT    NOT NULL,
    maker             TEXT    NOT NULL,
    model             TEXT    NOT NULL,
    serial            TEXT    NOT NULL,
    firmware          TEXT    NOT NULL,
    connection        TEXT,
    compensation_json TEXT    CHECK (compensation_json IS NULL OR json_valid(compensation_json)),
    UNIQUE (run_id, role)
);

CREATE TABLE sweeps (
    id              INTEGER PRIMARY KEY,
    run_id          INTEGER NOT NULL REFERENCES runs (id) ON DELETE CASCADE,
    seq             INTEGER NOT NULL CHECK (seq >= 1),
    step_name       TEXT    NOT NULL,
    instrument_role TEXT,
    trace_name      TEXT,
    quantity        TEXT    NOT NULL CHECK (quantity IN ('S11', 'S21', 'S12', 'S22', 'power')),
    unit            TEXT    NOT NULL CHECK (unit = CASE quantity WHEN 'power' THEN 'dBm' ELSE 'dB' END),
    point_count     INTEGER NOT NULL CHECK (point_count >= 1),
    axis_kind       TEXT    NOT NULL CHECK (axis_kind IN ('linear', 'log', 'list')),
    start_hz        REAL    NOT NULL,
    stop_hz         REAL    NOT NULL,
    axis_hz         BLOB    CHECK (axis_hz IS NULL OR length(axis_hz) = 8 * point_count),
    samples         BLOB    NOT NULL
        CHECK (length(samples) = point_count * CASE quantity WHEN 'power' THEN 8 ELSE 16 END),
    settings_json   TEXT    CHECK (settings_json IS NULL OR json_valid(settings_json)),
    acquired_utc    TEXT    NOT NULL
        CHECK (acquired_utc GLOB '[0-9][0-9][0-9][0-9]-[0-9][0-9]-[0-9][0-9]T[0-9][0-9]:[0-9][0-9]:[0-9][0-9].[0-9][0-9][0-9]Z'),
    flags           INTEGER NOT NULL DEFAULT 0 CHECK (flags >= 0),
    -- Only a linear axis may be rebuilt from start, stop and point count alone.
    CHECK (axis_kind = 'linear' OR axis_hz IS NOT NULL),
    UNIQUE (run_id, seq),
    -- Lets figures and checks name (sweep, run) pairs that must agree.
    UNIQUE (id, run_id)
);

CREATE TABLE figures (
    id       INTEGER PRIMARY KEY,
    run_id   INTEGER NOT NULL,
    sweep_id INTEGER NOT NULL,
    key      TEXT    NOT NULL,
    label    TEXT    NOT NULL,
    value    REAL,
    unit     TEXT    NOT NULL,
    reason   TEXT,
    -- A figure has a value or the reason it has none, never both.
    CHECK ((value IS NULL) <> (reason IS NULL)),
    UNIQUE (sweep_id, key),
    FOREIGN KEY (sweep_id, run_id) REFERENCES sweeps (id, run_id) ON DELETE CASCADE
);

CREATE INDEX figures_by_run ON figures (run_id);

CREATE TABLE checks (
    id            INTEGER PRIMARY KEY,
    run_id        INTEGER NOT NULL REFERENCES runs (id) ON DELETE CASCADE,
    sweep_id      INTEGER,
    name          TEXT    NOT NULL,
    kind          TEXT    NOT NULL CHECK (kind IN ('mask', 'figure_limit')),
    passed        INTEGER NOT NULL CHECK (passed IN (0, 1)),
    measured      REAL,
    measured_unit TEXT,
    limit_text    TEXT,
    margin        REAL,
    margin_unit   TEXT,
    worst_hz      REAL,
    message       TEXT,
    FOREIGN KEY (sweep_id, run_id) REFERENCES sweeps (id, run_id) ON DELETE CASCADE
);

CREATE INDEX checks_by_run ON checks (run_id);
CREATE INDEX checks_by_sweep ON checks (sweep_id);

-- The verdict of each board: the status of its latest single or batch run (tuning sessions
-- adjust a board, they do not judge it). Ties on start time go to the later id.
CREATE VIEW latest_verdicts AS
SELECT dut_serial, lot, run_id, verdict, started_utc, ended_utc, plan_name, plan_sha256, is_retest, runs
FROM (
    SELECT r.dut_serial,
           r.lot,
           r.id AS run_id,
           r.status AS verdict,
           r.started_utc,
           r.ended_utc,
           r.plan_name,
           r.plan_sha256,
           r.is_retest,
           count(*) OVER (PARTITION BY r.dut_serial) AS runs,
           row_number() OVER (PARTITION BY r.dut_serial ORDER BY r.started_utc DESC, r.id DESC) AS recency
    FROM runs r
    WHERE r.dut_serial IS NOT NULL AND r.mode <> 'tuning'
)
WHERE recency = 1;

-- One row per lot: how many boards, and how many of them pass or fail by their latest run.
CREATE VIEW lot_summary AS
SELECT lot,
       count(*) AS boards,
       sum(verdict = 'passed') AS passed,
       sum(verdict = 'failed') AS failed,
       sum(verdict NOT IN ('passed', 'failed')) AS other,
       round(100.0 * sum(verdict = 'passed') / count(*), 1) AS yield_percent,
       sum(runs) AS runs,
       min(started_utc) AS first_started_utc,
       max(started_utc) AS last_started_utc
FROM latest_verdicts
GROUP BY lot;

-- Every figure of every sweep, with the run it belongs to.
CREATE VIEW run_figures AS
SELECT r.id AS run_id,
       r.dut_serial,
       r.lot,
       r.status AS run_status,
       s.id AS sweep_id,
       s.seq,
       s.step_name,
       s.trace_name,
       s.quantity,
       s.acquired_utc,
       f.key,
       f.value,
       f.unit,
       f.reason
FROM figures f
JOIN sweeps s ON s.id = f.sweep_id
JOIN runs r ON r.id = f.run_id;

-- One row per sweep, its figures gathered into a JSON object of key to value (null when not computable).
CREATE VIEW run_sweeps AS
SELECT s.run_id,
       s.id AS sweep_id,
       s.seq,
       s.step_name,
       s.instrument_role,
       s.trace_name,
       s.quantity,
       s.unit,
       s.point_count,
       s.axis_kind,
       s.start_hz,
       s.stop_hz,
       s.acquired_utc,
       s.flags,
       (SELECT json_group_object(key, value)
        FROM (SELECT f.key, f.value FROM figures f WHERE f.sweep_id = s.id ORDER BY f.id)) AS figures
FROM sweeps s;
