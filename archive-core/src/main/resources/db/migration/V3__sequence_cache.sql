-- Variset archive, schema version 3: the id sequences of routes and holds keep 1,000 values (50,000 ids) in memory
-- instead of H2's default 32. H2 writes a sequence's state with a commit of its own each time its cache runs out, and
-- with WRITE_DELAY=0 that also wrote the pending pages of a large import every 1,600 holds. Values not used before a
-- process ends leave a gap in the ids, which nothing depends on.
ALTER SEQUENCE route_seq CACHE 1000;
ALTER SEQUENCE hold_seq CACHE 1000;
