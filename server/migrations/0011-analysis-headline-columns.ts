import type { QueryInterface } from 'sequelize'

/**
 * The mid-band figures a captures list shows become columns of the analysis (the worker writes
 * them with the result), so the list never reads a full result. Existing analyses are filled from
 * their stored results with the rule of shared/jobs/analysisHeadline.ts: the mean over the bands
 * centred 355 Hz–1413 Hz of the values that are present.
 */
export async function up(qi: QueryInterface): Promise<void> {
  await qi.sequelize.transaction(async (transaction) => {
    const run = (sql: string) => qi.sequelize.query(sql, { transaction })
    await run(`
      ALTER TABLE analyses
        ADD COLUMN headline_t30_s DOUBLE PRECISION,
        ADD COLUMN headline_t20_s DOUBLE PRECISION,
        ADD COLUMN headline_edt_s DOUBLE PRECISION,
        ADD COLUMN headline_c80_db DOUBLE PRECISION`)
    await run(`
      UPDATE analyses a SET
        headline_t30_s = h.t30, headline_t20_s = h.t20, headline_edt_s = h.edt, headline_c80_db = h.c80
      FROM (
        SELECT an.id,
          avg((band->>'T30')::double precision) AS t30,
          avg((band->>'T20')::double precision) AS t20,
          avg((band->>'EDT')::double precision) AS edt,
          avg((band->>'C80')::double precision) AS c80
        FROM analyses an, jsonb_array_elements(an.result->'bands') AS band
        WHERE an.result IS NOT NULL AND (band->>'centreHz')::double precision BETWEEN 355 AND 1413
        GROUP BY an.id
      ) h
      WHERE a.id = h.id`)
  })
}

export async function down(qi: QueryInterface): Promise<void> {
  await qi.sequelize.query(`
    ALTER TABLE analyses
      DROP COLUMN headline_t30_s, DROP COLUMN headline_t20_s, DROP COLUMN headline_edt_s, DROP COLUMN headline_c80_db`)
}
