-- Schema version 3 of a BenchRunner result file: a board's verdict is its latest run that ended
-- passed or failed. Described in docs/storage.md. A stopped, errored, interrupted or still running
-- run gives no verdict and leaves the board as it was; a board with no such run has no verdict.

-- One row per board with a verdict. Verdict runs sort first, so row 1 is the latest of them;
-- runs still counts every single and batch run of the board.
DROP VIEW lot_summary;
DROP VIEW latest_verdicts;
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
           row_number() OVER (PARTITION BY r.dut_serial
                              ORDER BY r.status IN ('passed', 'failed') DESC, r.started_utc DESC, r.id DESC) AS recency
    FROM runs r
    WHERE r.dut_serial IS NOT NULL AND r.mode <> 'tuning'
)
WHERE recency = 1 AND verdict IN ('passed', 'failed');

-- One row per lot. A board with a verdict belongs to the lot of its latest verdict run; a board
-- without one (untested: every run stopped or unfinished) to the lot of its latest run, counted
-- in other. The yield is over the boards with a verdict, NULL when there are none.
CREATE VIEW lot_summary AS
SELECT lot,
       count(*) AS boards,
       sum(verdict = 'passed') AS passed,
       sum(verdict = 'failed') AS failed,
       sum(verdict NOT IN ('passed', 'failed')) AS other,
       round(100.0 * sum(verdict = 'passed') / nullif(sum(verdict IN ('passed', 'failed')), 0), 1) AS yield_percent,
       sum(runs) AS runs,
       min(started_utc) AS first_started_utc,
       max(started_utc) AS last_started_utc
FROM (
    SELECT r.lot,
           r.status AS verdict,
           r.started_utc,
           count(*) OVER (PARTITION BY r.dut_serial) AS runs,
           row_number() OVER (PARTITION BY r.dut_serial
                              ORDER BY r.status IN ('passed', 'failed') DESC, r.started_utc DESC, r.id DESC) AS recency
    FROM runs r
    WHERE r.dut_serial IS NOT NULL AND r.mode <> 'tuning'
)
WHERE recency = 1
GROUP BY lot;
