-- Racing uploads could give two items of one revision the same position. Before positions become unique
-- (next migration), each revision that has such a clash is renumbered 0, 1, 2, … in its present order
-- (position, then the time it was added); revisions without a clash keep their positions.
UPDATE submittal_items AS i
SET position = r.n
FROM (
  SELECT id, (row_number() OVER (PARTITION BY submittal_id ORDER BY position, created_at, id) - 1)::integer AS n
  FROM submittal_items
  WHERE submittal_id IN (
    SELECT submittal_id FROM submittal_items GROUP BY submittal_id, position HAVING count(*) > 1
  )
) AS r
WHERE i.id = r.id AND i.position <> r.n;
