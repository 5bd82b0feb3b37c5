-- Variset archive, schema version 1: gyms, walls, setters, resets, routes, hold placements, gym settings.
-- Written in SQL that both H2 and PostgreSQL accept. Sequences step by 50 to match Hibernate's pooled ids.

CREATE SEQUENCE gym_seq START WITH 1 INCREMENT BY 50;
CREATE SEQUENCE wall_seq START WITH 1 INCREMENT BY 50;
CREATE SEQUENCE setter_seq START WITH 1 INCREMENT BY 50;
CREATE SEQUENCE reset_seq START WITH 1 INCREMENT BY 50;
CREATE SEQUENCE route_seq START WITH 1 INCREMENT BY 50;
CREATE SEQUENCE hold_seq START WITH 1 INCREMENT BY 50;
CREATE SEQUENCE gym_setting_seq START WITH 1 INCREMENT BY 50;

CREATE TABLE gym (
    id BIGINT NOT NULL PRIMARY KEY,
    name VARCHAR(255) NOT NULL,
    time_zone VARCHAR(64) NOT NULL,
    CONSTRAINT gym_name_unique UNIQUE (name)
);

CREATE TABLE wall (
    id BIGINT NOT NULL PRIMARY KEY,
    gym_id BIGINT NOT NULL REFERENCES gym (id),
    name VARCHAR(255) NOT NULL,
    discipline VARCHAR(16) CHECK (discipline IN ('BOULDER', 'ROPE', 'BOTH')),
    angle_deg DOUBLE PRECISION,
    height_m DOUBLE PRECISION,
    width_m DOUBLE PRECISION,
    cycle_days INTEGER,
    extra_fields VARCHAR(100000),
    CONSTRAINT wall_name_unique UNIQUE (gym_id, name)
);

CREATE TABLE setter (
    id BIGINT NOT NULL PRIMARY KEY,
    name VARCHAR(255) NOT NULL,
    CONSTRAINT setter_name_unique UNIQUE (name)
);

CREATE TABLE reset (
    id BIGINT NOT NULL PRIMARY KEY,
    gym_id BIGINT NOT NULL REFERENCES gym (id),
    wall_id BIGINT NOT NULL REFERENCES wall (id),
    label VARCHAR(255) NOT NULL,
    reset_on DATE NOT NULL,
    CONSTRAINT reset_label_unique UNIQUE (gym_id, label)
);
CREATE INDEX reset_wall_date ON reset (wall_id, reset_on);

CREATE TABLE route (
    id BIGINT NOT NULL PRIMARY KEY,
    gym_id BIGINT NOT NULL REFERENCES gym (id),
    wall_id BIGINT NOT NULL REFERENCES wall (id),
    reset_id BIGINT NOT NULL REFERENCES reset (id),
    label VARCHAR(255) NOT NULL,
    set_on DATE NOT NULL,
    stripped_on DATE,
    discipline VARCHAR(16) NOT NULL CHECK (discipline IN ('BOULDER', 'ROPE')),
    grade_text VARCHAR(255) NOT NULL,
    grade_scale VARCHAR(16) NOT NULL CHECK (grade_scale IN ('V', 'FONT', 'YDS', 'FRENCH', 'UIAA', 'IRCRA')),
    grade_ircra DOUBLE PRECISION NOT NULL,
    color VARCHAR(255),
    angle_deg DOUBLE PRECISION,
    moves VARCHAR(10000),
    styles VARCHAR(10000),
    move_difficulty VARCHAR(10000),
    notes VARCHAR(100000),
    extra_fields VARCHAR(100000),
    CONSTRAINT route_key_unique UNIQUE (wall_id, label, set_on),
    CONSTRAINT route_strip_after_set CHECK (stripped_on IS NULL OR stripped_on > set_on)
);
CREATE INDEX route_reset ON route (reset_id);
CREATE INDEX route_gym_set_on ON route (gym_id, set_on);
CREATE INDEX route_wall_set_on ON route (wall_id, set_on);

CREATE TABLE route_setter (
    route_id BIGINT NOT NULL REFERENCES route (id) ON DELETE CASCADE,
    setter_id BIGINT NOT NULL REFERENCES setter (id),
    ord INTEGER NOT NULL,
    PRIMARY KEY (route_id, ord)
);
CREATE INDEX route_setter_setter ON route_setter (setter_id);

CREATE TABLE hold_placement (
    id BIGINT NOT NULL PRIMARY KEY,
    route_id BIGINT NOT NULL REFERENCES route (id) ON DELETE CASCADE,
    ordinal INTEGER NOT NULL,
    seq INTEGER,
    role VARCHAR(16) NOT NULL CHECK (role IN ('HAND', 'FOOT', 'START', 'FINISH')),
    hold_type VARCHAR(64) NOT NULL,
    hold_size VARCHAR(8) CHECK (hold_size IN ('XS', 'S', 'M', 'L', 'XL')),
    grip_deg VARCHAR(1000),
    hold_ref VARCHAR(255),
    x_m DOUBLE PRECISION,
    y_m DOUBLE PRECISION,
    extra_fields VARCHAR(100000)
);
CREATE INDEX hold_route ON hold_placement (route_id, ordinal);

CREATE TABLE gym_setting (
    id BIGINT NOT NULL PRIMARY KEY,
    gym_id BIGINT NOT NULL REFERENCES gym (id),
    setting_key VARCHAR(64) NOT NULL,
    scope VARCHAR(16) NOT NULL,
    effective_on DATE NOT NULL,
    value_json VARCHAR(100000) NOT NULL
);
CREATE INDEX gym_setting_lookup ON gym_setting (gym_id, setting_key, scope, effective_on);
