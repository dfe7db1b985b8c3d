import { Sequelize } from 'sequelize'
import pg from 'pg'

// PostgreSQL returns NUMERIC/DOUBLE as numbers for us: DOUBLE PRECISION (701) is parsed as a float.
pg.types.setTypeParser(701, (value) => Number.parseFloat(value))

export function createSequelize(databaseUrl: string): Sequelize {
  return new Sequelize(databaseUrl, {
    dialect: 'postgres',
    dialectModule: pg,
    logging: false,
    define: { underscored: true },
    pool: { max: 10, idle: 10_000 },
  })
}
