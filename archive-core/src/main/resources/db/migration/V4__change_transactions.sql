-- Variset archive, schema version 4: the change log records the transaction that made each change, for shared
-- archives on PostgreSQL. There many clients write at once, and a change's id (drawn when the row is written) is not
-- the order in which changes commit: a reader that remembered "everything up to id N" would skip a change that
-- committed after it read, with an id below N. A reader remembers instead the oldest transaction still running when
-- it read (the xmin of its snapshot) and next reads every change made by that transaction or a later one.
-- Embedded archives (one process at a time) leave the column empty and keep using ids.
ALTER TABLE route_change ADD COLUMN tx BIGINT;
CREATE INDEX route_change_tx ON route_change (tx);

-- Facts about the archive as a whole. 'identity' is a random id written when the archive is first opened, so that
-- derived data kept elsewhere (a client's search index) can tell one archive from another made in its place.
CREATE TABLE archive_info (
    info_key VARCHAR(64) NOT NULL PRIMARY KEY,
    info_value VARCHAR(255) NOT NULL
);
