-- Schema version 2 of a BenchRunner result file: measurement validity. Described in docs/storage.md.
-- Each sweep says what path compensation its levels carry; checks may be attenuation-step overload
-- checks, keep a JSON account of what they judged, and carry flags (bit 0: the trace they judged was
-- measured while the analyser was overloaded).

ALTER TABLE sweeps ADD COLUMN compensation TEXT;

-- SQLite cannot widen a CHECK constraint in place: the checks table is rebuilt with the same rows.
CREATE TABLE checks_v2 (
    id            INTEGER PRIMARY KEY,
    run_id        INTEGER NOT NULL REFERENCES runs (id) ON DELETE CASCADE,
    sweep_id      INTEGER,
    name          TEXT    NOT NULL,
    kind          TEXT    NOT NULL CHECK (kind IN ('mask', 'figure_limit', 'overload')),
    passed        INTEGER NOT NULL CHECK (passed IN (0, 1)),
    measured      REAL,
    measured_unit TEXT,
    limit_text    TEXT,
    margin        REAL,
    margin_unit   TEXT,
    worst_hz      REAL,
    message       TEXT,
    flags         INTEGER NOT NULL DEFAULT 0 CHECK (flags >= 0),
    detail_json   TEXT    CHECK (detail_json IS NULL OR json_valid(detail_json)),
    FOREIGN KEY (sweep_id, run_id) REFERENCES sweeps (id, run_id) ON DELETE CASCADE
);

INSERT INTO checks_v2 (id, run_id, sweep_id, name, kind, passed, measured, measured_unit, limit_text, margin,
                       margin_unit, worst_hz, message)
SELECT id, run_id, sweep_id, name, kind, passed, measured, measured_unit, limit_text, margin,
       margin_unit, worst_hz, message
FROM checks;

DROP TABLE checks;
ALTER TABLE checks_v2 RENAME TO checks;

CREATE INDEX checks_by_run ON checks (run_id);
CREATE INDEX checks_by_sweep ON checks (sweep_id);

-- run_figures and run_sweeps gain the compensation column, so every figure says what its levels carry.
DROP VIEW run_figures;
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
       f.reason,
       s.compensation,
       (s.flags & 1) <> 0 AS sweep_overloaded
FROM figures f
JOIN sweeps s ON s.id = f.sweep_id
JOIN runs r ON r.id = f.run_id;

DROP VIEW run_sweeps;
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
       s.compensation,
       (SELECT json_group_object(key, value)
        FROM (SELECT f.key, f.value FROM figures f WHERE f.sweep_id = s.id ORDER BY f.id)) AS figures
FROM sweeps s;

-- Every check with its run and the sweep it judged, the sweep's conditions spelled out.
CREATE VIEW run_checks AS
SELECT c.run_id,
       r.dut_serial,
       r.lot,
       c.id AS check_id,
       c.name,
       c.kind,
       c.passed,
       c.margin,
       c.margin_unit,
       c.message,
       (c.flags & 1) <> 0 AS on_overloaded_trace,
       s.trace_name,
       s.compensation,
       coalesce((s.flags & 1) <> 0, 0) AS sweep_overloaded
FROM checks c
JOIN runs r ON r.id = c.run_id
LEFT JOIN sweeps s ON s.id = c.sweep_id;
