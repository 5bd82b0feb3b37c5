-- Variset archive, schema version 6: the accounts of the web workspace. A name is kept in lower case and is the key;
-- a role is one of viewer, setter, head_setter, admin; gyms, when set, is a JSON list of the gym names the account is
-- limited to (null: every gym). Times are
-- ISO-8601 instants in UTC, as text, so that they read back alike on H2 and PostgreSQL (a copy between the two checks
-- its rows by digest). The password is kept only as a memory-hard hash in PHC form ($argon2id$...).
CREATE TABLE account (
    name VARCHAR(64) NOT NULL PRIMARY KEY,
    role VARCHAR(16) NOT NULL,
    gyms VARCHAR(4000),
    password_hash VARCHAR(512) NOT NULL,
    created_at VARCHAR(40) NOT NULL,
    password_set_at VARCHAR(40) NOT NULL
);
