-- Session rows are now keyed by the SHA-256 of the cookie's token, never the token itself.
-- Rows written before kept the token as their id and cannot be turned into hashes inside SQLite,
-- so they are removed: everyone signs in once more, and a copy of an older database holds no
-- working session.
DELETE FROM `sessions`;
