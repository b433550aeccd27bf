-- The session read of every signed-in request (auth/sessions.repository.ts findSession) as a function that
-- runs as its owner, the connecting role, whoever calls it: the session and its account are found across
-- shops before the request's shop is known, and called this way the read needs no change of role or shop
-- setting on the connection, which on PGlite's one connection cost more than the read itself. The caller
-- must know the session's id (the secret in its cookie) to get anything back. PL/pgSQL keeps the query's
-- plan for the connection instead of planning it on every request.
CREATE FUNCTION session_with_account(p_sid text, p_now timestamptz)
RETURNS TABLE (sess jsonb, id integer, email text, name text, role text, units text, demo boolean, active boolean, shop_id integer, shop_status text)
LANGUAGE plpgsql STABLE SECURITY DEFINER SET search_path = pg_catalog, public AS $$
BEGIN
  RETURN QUERY
    SELECT s.sess, u.id, u.email, u.name, u.role, u.units, u.demo, u.active, u.shop_id, sh.status
    FROM sessions s
    LEFT JOIN users u ON u.id = (s.sess #>> '{passport,user}')::integer
    -- A suspended shop's sessions stop working at their next request (auth.service.ts usableUser).
    LEFT JOIN shops sh ON sh.id = u.shop_id
    WHERE s.sid = p_sid AND s.expire > p_now;
END $$;--> statement-breakpoint
REVOKE ALL ON FUNCTION session_with_account(text, timestamptz) FROM PUBLIC;--> statement-breakpoint
GRANT EXECUTE ON FUNCTION session_with_account(text, timestamptz) TO borewright_app;
